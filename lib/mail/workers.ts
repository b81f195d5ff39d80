import "server-only";
import type PgBoss from "pg-boss";
import { getBoss, JOBS, type MailDeliverJob } from "@/lib/jobs/boss";
import { logger } from "@/lib/logger";
import { deliverEmail, flushQueuedEmails } from "./outbox";

/** How old a queued e-mail must be before the sweep takes it (commit → enqueue normally takes ms). */
export const SWEEP_AFTER_SECONDS = 30;

const registered = new WeakSet<PgBoss>();

/** Registers the mail workers and the once-a-minute sweep on a started pg-boss (once per instance). */
export async function registerMailWorkers(
  boss: PgBoss,
  options: { pollingIntervalSeconds?: number } = {},
): Promise<void> {
  if (registered.has(boss)) return;
  registered.add(boss);
  const pollingIntervalSeconds = options.pollingIntervalSeconds ?? 2;
  await boss.work<MailDeliverJob>(
    JOBS.mailDeliver,
    { includeMetadata: true, pollingIntervalSeconds },
    async (jobs) => {
      for (const job of jobs) {
        await deliverEmail(job.data.messageId, { finalAttempt: job.retryCount >= job.retryLimit });
      }
    },
  );
  await boss.work(
    JOBS.mailSweep,
    { pollingIntervalSeconds: Math.max(pollingIntervalSeconds, 5) },
    async () => {
      const enqueued = await flushQueuedEmails({ olderThanSeconds: SWEEP_AFTER_SECONDS });
      if (enqueued > 0) logger.info({ enqueued }, "mail sweep enqueued e-mails left queued");
    },
  );
  await boss.schedule(JOBS.mailSweep, "* * * * *");
}

/** Starts pg-boss with the mail workers; used by the app server (instrumentation) and tests. */
export async function startMailWorkers(options: { pollingIntervalSeconds?: number } = {}): Promise<PgBoss> {
  const boss = await getBoss();
  await registerMailWorkers(boss, options);
  return boss;
}
