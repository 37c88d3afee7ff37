// Background jobs on PostgreSQL (pg-boss). The queue starts on first use, so processes that
// never run a job (most tests, the command line) never create pg-boss's tables.
import PgBoss from 'pg-boss';

export type JobHandler = (data: Record<string, unknown>) => Promise<void>;

export type JobQueue = {
  send: (name: string, data: Record<string, unknown>) => Promise<void>;
  stop: () => Promise<void>;
};

export function createJobQueue(connectionString: string, handlers: Record<string, JobHandler>, onError: (error: Error) => void): JobQueue {
  let started: Promise<PgBoss> | null = null;

  const start = () => {
    started ??= (async () => {
      const boss = new PgBoss({ connectionString, max: 3 });
      boss.on('error', onError);
      await boss.start();
      for (const [name, handler] of Object.entries(handlers)) {
        await boss.createQueue(name);
        await boss.work<Record<string, unknown>>(name, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async (jobs) => {
          for (const job of jobs) await handler(job.data);
        });
      }
      return boss;
    })();
    return started;
  };

  return {
    async send(name, data) {
      const boss = await start();
      await boss.send(name, data, { retryLimit: 0, expireInSeconds: 15 * 60 });
    },
    async stop() {
      if (!started) return;
      const boss = await started;
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
    },
  };
}
