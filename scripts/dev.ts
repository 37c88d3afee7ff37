// `npm run dev`: the project's PostgreSQL once, the API in watch mode on :3001, and Vite with hot
// reload on :5173 proxying /api to it. Ctrl-C stops everything.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { openDatabase } from '../server/database';
import { readEnv } from '../server/env';

const env = readEnv();
const apiPort = 3001;
const bin = (name: string) => path.resolve('node_modules/.bin', name);

const database = await openDatabase({ ...env, BELLWETHER_DATA_DIR: path.resolve(env.BELLWETHER_DATA_DIR) }, console.log);
const children: ChildProcess[] = [
  spawn(bin('tsx'), ['watch', '--clear-screen=false', 'server/index.ts', '--api-only', '--seed'], {
    stdio: 'inherit',
    env: { ...process.env, DATABASE_URL: database.url, PORT: String(apiPort), APP_URL: 'http://localhost:5173' },
  }),
  spawn(bin('vite'), [], { stdio: 'inherit', env: { ...process.env, BELLWETHER_API_PORT: String(apiPort) } }),
];

let stopping = false;
function stop() {
  if (stopping) return;
  stopping = true;
  for (const child of children) child.kill('SIGTERM');
  setTimeout(() => {
    database.stop();
    process.exit(0);
  }, 1500);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const child of children) child.on('exit', stop);
