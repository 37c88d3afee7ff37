#!/usr/bin/env node
// Installed entry point of the command line. The TypeScript sources are bundled once with esbuild
// into node_modules/.cache/bellwether/ and the bundle is reused while no source file it was made
// from has changed (the list comes from esbuild's metafile), so a run starts in plain Node.js
// instead of compiling through tsx each time. Where the bundle cannot be made (no esbuild, no
// writable cache), the sources run through tsx as before.
import { mkdirSync, readdirSync, readFileSync, renameSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const entry = join(root, 'server/cli/index.ts');
const cacheDir = join(root, 'node_modules/.cache/bellwether');
const inputsFile = join(cacheDir, 'inputs.json');

/** The bundle's entry, when it is newer than every source file it was made from (and this file). */
function freshBundle() {
  try {
    // inputs.json is written last: its time is the bundle's
    const built = statSync(inputsFile).mtimeMs;
    const inputs = JSON.parse(readFileSync(inputsFile, 'utf8'));
    if (!Array.isArray(inputs) || inputs.length === 0) return null;
    for (const file of [fileURLToPath(import.meta.url), join(root, 'package-lock.json'), ...inputs]) {
      if (statSync(resolve(root, file)).mtimeMs > built) return null;
    }
    return join(cacheDir, 'index.mjs');
  } catch {
    return null;
  }
}

/**
 * Packages stay in node_modules, except the few small functions taken from simple-statistics:
 * bundled, only they are kept, where loading the whole package costs a command about 25 ms.
 */
const BUNDLED_PACKAGES = new Set(['simple-statistics']);
const externalPackages = {
  name: 'external-packages',
  setup(build) {
    build.onResolve({ filter: /^[^./]/ }, (args) => {
      if (args.path.startsWith('@shared/') || args.path.startsWith('@/')) return undefined;
      const name = args.path.startsWith('@')
        ? args.path.split('/').slice(0, 2).join('/')
        : args.path.split('/')[0];
      return BUNDLED_PACKAGES.has(name) ? undefined : { path: args.path, external: true };
    });
  },
};

async function buildBundle() {
  const esbuild = await import('esbuild');
  const result = await esbuild.build({
    absWorkingDir: root,
    entryPoints: [entry],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    // one chunk per command, so that packages stay in node_modules and load only for the command
    // that needs them (exceljs only for `parse`)
    splitting: true,
    plugins: [externalPackages],
    outExtension: { '.js': '.mjs' },
    tsconfig: join(root, 'tsconfig.json'),
    write: false,
    metafile: true,
    logLevel: 'silent',
    outdir: cacheDir,
    // chunk names carry a hash of their content, so a run never loads a chunk of another build
    chunkNames: 'chunk-[hash]',
  });
  mkdirSync(cacheDir, { recursive: true });
  // each file is written under a temporary name and renamed; inputs.json last, so a run that
  // starts meanwhile either sees the whole new bundle or builds its own
  const suffix = `.${process.pid}.tmp`;
  for (const file of result.outputFiles) {
    writeFileSync(file.path + suffix, file.contents);
    renameSync(file.path + suffix, file.path);
  }
  writeFileSync(inputsFile + suffix, JSON.stringify(Object.keys(result.metafile.inputs)));
  renameSync(inputsFile + suffix, inputsFile);
  // chunks of earlier builds go once they are old enough that no run can still be loading them
  const kept = new Set(result.outputFiles.map((file) => file.path));
  for (const name of readdirSync(cacheDir)) {
    const file = join(cacheDir, name);
    if (!name.endsWith('.mjs') || kept.has(file)) continue;
    try {
      if (Date.now() - statSync(file).mtimeMs > 10 * 60 * 1000) unlinkSync(file);
    } catch {
      // another run removed it first
    }
  }
  return join(cacheDir, 'index.mjs');
}

let compiled = freshBundle();
if (!compiled) {
  try {
    compiled = await buildBundle();
  } catch {
    compiled = null;
  }
}
if (compiled) {
  await import(pathToFileURL(compiled).href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  await import(pathToFileURL(entry).href);
}
