// `npm run db:migrate` (start the project's cluster, apply migrations, stop) and
// `tsx scripts/db.ts seed` (the same plus the demo seed).
import path from 'node:path';
import { createDb } from '../server/db/client';
import { seedDemo } from '../server/db/seed';
import { openDatabase } from '../server/database';
import { readEnv } from '../server/env';

const command = process.argv[2];
if (command !== 'migrate' && command !== 'seed') {
  console.error('usage: tsx scripts/db.ts migrate|seed');
  process.exit(2);
}
const env = readEnv();
const database = await openDatabase({ ...env, BELLWETHER_DATA_DIR: path.resolve(env.BELLWETHER_DATA_DIR) }, console.log);
try {
  console.log('Migrations applied.');
  if (command === 'seed') {
    const { pool, db } = createDb(database.url);
    await seedDemo(db, console.log);
    await pool.end();
  }
} finally {
  database.stop();
}
