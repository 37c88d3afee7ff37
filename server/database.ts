// Which PostgreSQL the app uses: DATABASE_URL when set (a managed server), otherwise the
// project's own cluster in <data dir>/postgres on 127.0.0.1:<BELLWETHER_PG_PORT>.
import path from 'node:path';
import { runMigrations } from './db/client';
import { createDatabaseIfMissing, startCluster } from './db/postgres';
import type { Env } from './env';

export type OpenDatabase = { url: string; stop: () => void; description: string };

export const databaseName = 'bellwether';

export async function openDatabase(env: Env, log: (line: string) => void): Promise<OpenDatabase> {
  if (env.DATABASE_URL) {
    await runMigrations(env.DATABASE_URL);
    return { url: env.DATABASE_URL, stop: () => {}, description: 'DATABASE_URL' };
  }
  const dataDir = path.resolve(env.BELLWETHER_DATA_DIR, 'postgres');
  const cluster = startCluster({ dataDir, port: env.BELLWETHER_PG_PORT, log });
  await createDatabaseIfMissing(cluster.adminUrl('postgres'), databaseName);
  const url = cluster.adminUrl(databaseName);
  await runMigrations(url);
  return {
    url,
    stop: () => {
      if (!cluster.startedByUs) return;
      log('Stopping PostgreSQL…');
      cluster.stop();
    },
    description: `own cluster in ${dataDir} on 127.0.0.1:${env.BELLWETHER_PG_PORT}`,
  };
}
