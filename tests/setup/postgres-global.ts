// Vitest global set-up for integration tests: a throwaway PostgreSQL cluster on a free port
// (fsync off), one template database with every migration applied; each test file then gets its
// own copy (CREATE DATABASE … TEMPLATE …). The cluster and its folder are removed afterwards.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { runMigrations } from '../../server/db/client';
import { createDatabaseIfMissing, freePort, removeCluster, startCluster } from '../../server/db/postgres';

declare module 'vitest' {
  export interface ProvidedContext {
    pgAdminUrl: string;
    pgTemplate: string;
  }
}

const template = 'bw_template';

export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bellwether-test-pg-'));
  const port = await freePort();
  const cluster = startCluster({ dataDir, port, throwaway: true, log: () => {} });
  try {
    await createDatabaseIfMissing(cluster.adminUrl('postgres'), template);
    await runMigrations(cluster.adminUrl(template));
  } catch (error) {
    cluster.stop();
    removeCluster(dataDir);
    throw error;
  }
  project.provide('pgAdminUrl', cluster.adminUrl('postgres'));
  project.provide('pgTemplate', template);
  return () => {
    cluster.stop();
    removeCluster(dataDir);
  };
}
