// The project's own PostgreSQL: find Debian's binaries (installing the package when missing),
// initialise a cluster in a folder of ours, start it on 127.0.0.1 on a port of ours, stop it.
// PostgreSQL refuses to run as root, so as root the folder belongs to `postgres` and every
// server binary runs through `runuser -u postgres --`.
import { execFileSync, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';

export type Log = (line: string) => void;

export type ClusterOptions = {
  dataDir: string;
  port: number;
  /** Throwaway clusters trust loopback and skip fsync; persistent ones use a password. */
  throwaway?: boolean;
  log?: Log;
};

export type RunningCluster = {
  dataDir: string;
  port: number;
  adminUrl: (database: string) => string;
  startedByUs: boolean;
  stop: () => void;
};

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

function versionOf(dir: string): number {
  return Number.parseFloat(path.basename(dir)) || 0;
}

/** Debian keeps initdb and pg_ctl in /usr/lib/postgresql/<version>/bin, off the PATH. */
export function findPgBinDir(): string | null {
  const root = '/usr/lib/postgresql';
  if (fs.existsSync(root)) {
    const versions = fs
      .readdirSync(root)
      .map((v) => path.join(root, v))
      .filter((d) => fs.existsSync(path.join(d, 'bin', 'pg_ctl')))
      .sort((a, b) => versionOf(b) - versionOf(a));
    if (versions.length > 0) return path.join(versions[0], 'bin');
  }
  const which = spawnSync('sh', ['-c', 'command -v pg_ctl'], { encoding: 'utf8' });
  const found = which.stdout.trim();
  return which.status === 0 && found ? path.dirname(found) : null;
}

/** Installs Debian's postgresql when its binaries are missing (root or passwordless sudo). */
export function ensurePostgresInstalled(log: Log = console.log): string {
  const existing = findPgBinDir();
  if (existing) return existing;
  const command = 'apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y postgresql';
  let runner: string[] | null = null;
  if (isRoot()) runner = ['sh', '-c', command];
  else if (spawnSync('sudo', ['-n', 'true']).status === 0) runner = ['sudo', '-n', 'sh', '-c', command];
  if (!runner) {
    throw new Error(
      `PostgreSQL is not installed. Install Debian's package, then run the command again:\n  sudo sh -c '${command}'`,
    );
  }
  log('PostgreSQL is missing: installing Debian\'s "postgresql" package (one time)…');
  const result = spawnSync(runner[0], runner.slice(1), { stdio: 'inherit' });
  const dir = findPgBinDir();
  if (result.status !== 0 || !dir) throw new Error(`Installing PostgreSQL failed; run by hand:\n  ${command}`);
  return dir;
}

function asServerUser(binary: string, args: string[]): [string, string[]] {
  return isRoot() ? ['runuser', ['-u', 'postgres', '--', binary, ...args]] : [binary, args];
}

function runServerTool(binary: string, args: string[]): string {
  const [cmd, argv] = asServerUser(binary, args);
  try {
    return execFileSync(cmd, argv, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'], cwd: '/' });
  } catch (error) {
    const e = error as { stderr?: string; stdout?: string; message: string };
    throw new Error(`${path.basename(binary)} failed: ${e.stderr || e.stdout || e.message}`);
  }
}

function giveToServerUser(dir: string) {
  if (!isRoot()) return;
  execFileSync('chown', ['-R', 'postgres:postgres', dir]);
}

/** The postgres user must be able to walk down to a folder inside a root-owned checkout. */
function ensureTraversable(dir: string) {
  if (!isRoot()) return;
  let current = path.dirname(path.resolve(dir));
  while (current !== path.dirname(current)) {
    const mode = fs.statSync(current).mode;
    if ((mode & 0o001) === 0) fs.chmodSync(current, mode | 0o001);
    current = path.dirname(current);
  }
}

function passwordFile(dataDir: string) {
  return path.join(path.dirname(path.resolve(dataDir)), `${path.basename(dataDir)}.password`);
}

export function clusterPassword(dataDir: string): string | null {
  const file = passwordFile(dataDir);
  return fs.existsSync(file) ? fs.readFileSync(file, 'utf8').trim() : null;
}

function initCluster(bin: string, options: ClusterOptions) {
  const { dataDir, throwaway } = options;
  fs.mkdirSync(dataDir, { recursive: true, mode: 0o700 });
  ensureTraversable(dataDir);
  giveToServerUser(dataDir);
  const args = ['-D', dataDir, '-U', 'postgres', '-E', 'UTF8', '--locale=C.UTF-8', '--no-instructions'];
  if (throwaway) {
    args.push('--auth=trust', '--no-sync');
    runServerTool(path.join(bin, 'initdb'), args);
    return;
  }
  // A persistent cluster gets a generated password, kept beside the data folder (0600, ours).
  const password = randomBytes(18).toString('base64url');
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-pw-'));
  const pwfile = path.join(tmp, 'pw');
  fs.writeFileSync(pwfile, password, { mode: 0o644 });
  fs.chmodSync(tmp, 0o755);
  try {
    runServerTool(path.join(bin, 'initdb'), [
      ...args,
      '--auth-local=peer',
      '--auth-host=scram-sha-256',
      `--pwfile=${pwfile}`,
    ]);
  } finally {
    fs.rmSync(tmp, { recursive: true, force: true });
  }
  fs.writeFileSync(passwordFile(dataDir), password, { mode: 0o600 });
}

function isRunning(bin: string, dataDir: string): boolean {
  const [cmd, argv] = asServerUser(path.join(bin, 'pg_ctl'), ['status', '-D', dataDir]);
  return spawnSync(cmd, argv, { stdio: 'ignore', cwd: '/' }).status === 0;
}

export function startCluster(options: ClusterOptions): RunningCluster {
  const log = options.log ?? console.log;
  const bin = ensurePostgresInstalled(log);
  const dataDir = path.resolve(options.dataDir);
  const fresh = !fs.existsSync(path.join(dataDir, 'PG_VERSION'));
  if (fresh) {
    log(`Creating the PostgreSQL cluster in ${dataDir}`);
    initCluster(bin, { ...options, dataDir });
  }
  const password = options.throwaway ? null : clusterPassword(dataDir);
  const adminUrl = (database: string) =>
    `postgresql://postgres${password ? `:${encodeURIComponent(password)}` : ''}@127.0.0.1:${options.port}/${database}`;
  const stop = () => {
    if (!isRunning(bin, dataDir)) return;
    runServerTool(path.join(bin, 'pg_ctl'), ['stop', '-D', dataDir, '-m', 'fast', '-w', '-t', '60']);
  };
  if (isRunning(bin, dataDir)) {
    log(`PostgreSQL is already running from ${dataDir}`);
    return { dataDir, port: options.port, adminUrl, startedByUs: false, stop };
  }
  const settings = [
    `-p ${options.port}`,
    '-c listen_addresses=127.0.0.1',
    `-c unix_socket_directories='${dataDir}'`,
    ...(options.throwaway ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : []),
  ].join(' ');
  runServerTool(path.join(bin, 'pg_ctl'), [
    'start',
    '-D',
    dataDir,
    '-l',
    path.join(dataDir, 'postgres.log'),
    '-o',
    settings,
    '-w',
    '-t',
    '60',
  ]);
  return { dataDir, port: options.port, adminUrl, startedByUs: true, stop };
}

/** Removes a throwaway cluster's folder (after stop). */
export function removeCluster(dataDir: string) {
  fs.rmSync(dataDir, { recursive: true, force: true });
  fs.rmSync(passwordFile(dataDir), { force: true });
}

export async function createDatabaseIfMissing(adminUrl: string, name: string, template?: string) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`Unsafe database name: ${name}`);
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const exists = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (exists.rowCount === 0) {
      await client.query(`CREATE DATABASE ${name}${template ? ` TEMPLATE ${template}` : ''}`);
    }
  } finally {
    await client.end();
  }
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}
