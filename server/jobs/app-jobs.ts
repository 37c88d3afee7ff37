// The app's background jobs and their handlers.
import type { Logger } from '../context';
import type { Db } from '../db/client';
import { bootstrapQueue, runBootstrapJob } from '../services/analysis/jobs';
import { createJobQueue } from './queue';

export function createAppJobs(connectionString: string, db: Db, log: Logger) {
  return createJobQueue(
    connectionString,
    { [bootstrapQueue]: (data) => runBootstrapJob(db, String(data.jobId)) },
    (error) => log.warn(`Background job error: ${error.message}`),
  );
}
