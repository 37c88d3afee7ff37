// `npm run bench`: runs every bench/*.ts except this file, one after another, each in its own
// process (tsx), and passes their printed figures through.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..');
const files = readdirSync(here)
  .filter((f) => f.endsWith('.ts') && f !== 'run.ts')
  .sort();

let failed = 0;
for (const file of files) {
  process.stdout.write(`\n== bench/${file}\n`);
  const started = Date.now();
  const result = spawnSync(process.execPath, ['--import', 'tsx', join(here, file)], {
    cwd: root,
    stdio: 'inherit',
  });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  if (result.status !== 0) {
    failed++;
    process.stdout.write(
      `bench/${file} failed (exit ${result.status ?? result.signal}) after ${seconds} s\n`,
    );
  } else {
    process.stdout.write(`(bench/${file}: ${seconds} s)\n`);
  }
}
process.exitCode = failed > 0 ? 1 : 0;
