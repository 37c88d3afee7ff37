#!/usr/bin/env node
// `npm start`: makes sure dependencies are installed and the client is built, then runs the
// server with the demo seed. Plain JavaScript: it must run before node_modules exists.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
process.chdir(root);

function mtime(file) {
  try {
    return fs.statSync(file).mtimeMs;
  } catch {
    return 0;
  }
}

function newest(entry) {
  const stat = fs.statSync(entry, { throwIfNoEntry: false });
  if (!stat) return 0;
  if (!stat.isDirectory()) return stat.mtimeMs;
  let latest = stat.mtimeMs;
  for (const child of fs.readdirSync(entry)) latest = Math.max(latest, newest(path.join(entry, child)));
  return latest;
}

function run(command, args) {
  const result = spawnSync(command, args, { stdio: 'inherit' });
  if (result.status !== 0) {
    console.error(`\n${command} ${args.join(' ')} failed.`);
    process.exit(result.status ?? 1);
  }
}

// 1. Dependencies: install when node_modules is missing or older than the lock file.
const installed = path.join(root, 'node_modules/.package-lock.json');
if (!fs.existsSync(installed) || mtime(installed) < mtime(path.join(root, 'package-lock.json'))) {
  console.log('Installing dependencies…');
  run('npm', ['install', '--no-audit', '--no-fund']);
}

// 2. The client: rebuild when any of its sources is newer than the last build.
const builtAt = mtime(path.join(root, 'dist/client/index.html'));
const sources = ['src', 'shared', 'public', 'index.html', 'vite.config.ts', 'tailwind.config.ts', 'package-lock.json'];
if (sources.some((s) => newest(path.join(root, s)) > builtAt)) {
  console.log('Building the client…');
  run(path.join(root, 'node_modules/.bin/vite'), ['build', '--logLevel', 'warn']);
}

// 3. The server (database, migrations, demo seed, fake SMTP, HTTP). Ctrl-C reaches it directly;
// this wrapper only waits for it and passes on its exit code.
const server = spawn(path.join(root, 'node_modules/.bin/tsx'), ['server/index.ts', '--seed'], { stdio: 'inherit' });
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => server.kill(signal));
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
