import PgBoss from 'pg-boss';

/** Background jobs (pg-boss) on the app's own PostgreSQL, in the `pgboss` schema it manages itself. */
export const QUEUES = { print: 'print' } as const;

export interface JobsOptions {
  /** How often an idle worker looks for work (s); pg-boss's minimum is 0.5. */
  pollingIntervalSeconds?: number;
  /** Run pg-boss's maintenance and scheduling (off in tests, on in the app). */
  supervise?: boolean;
}

export async function startJobs(url: string, options: JobsOptions = {}): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: url,
    max: 4,
    supervise: options.supervise ?? true,
    schedule: false,
    // A finished print is kept in print_jobs; pg-boss's own rows can go after a week.
    deleteAfterDays: 7,
  });
  boss.on('error', () => {
    // Connection errors surface again on the next call; the worker loop keeps running.
  });
  await boss.start();
  await boss.createQueue(QUEUES.print, { name: QUEUES.print, retryLimit: 0, expireInMinutes: 5 });
  return boss;
}
