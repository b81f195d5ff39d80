import "server-only";
import PgBoss from "pg-boss";
import { databaseUrl } from "@/lib/db/url";
import { logger } from "@/lib/logger";

/** The job queues of the app; each is created (or updated) when pg-boss starts. */
export const JOBS = {
  /** Deliver one outbox e-mail: data { messageId }, job id = the message id. */
  mailDeliver: "mail.deliver",
  /** Every minute: hand any e-mail still queued after ~30 s to mail.deliver. */
  mailSweep: "mail.sweep",
  /** Every minute: release orders whose deposit is paid but whose own release failed. */
  releaseSweep: "floor.release-sweep",
} as const;

export interface MailDeliverJob {
  messageId: string;
}

function envInt(name: string, fallback: number): number {
  const value = Number(process.env[name]);
  return Number.isInteger(value) && value >= 0 ? value : fallback;
}

/**
 * Retries of a delivery: MAIL_RETRY_LIMIT retries (default 5, so 6 attempts) starting
 * MAIL_RETRY_DELAY_SECONDS apart (default 30) and doubling, about half an hour in all.
 */
export function mailRetryOptions(): Required<PgBoss.RetryOptions> {
  return {
    retryLimit: envInt("MAIL_RETRY_LIMIT", 5),
    retryDelay: envInt("MAIL_RETRY_DELAY_SECONDS", 30),
    retryBackoff: process.env.MAIL_RETRY_BACKOFF !== "0",
  };
}

function queueOptions(): Record<string, PgBoss.Queue> {
  return {
    [JOBS.mailDeliver]: {
      name: JOBS.mailDeliver,
      policy: "standard",
      expireInSeconds: 120,
      ...mailRetryOptions(),
    },
    [JOBS.mailSweep]: {
      name: JOBS.mailSweep,
      policy: "singleton",
      retryLimit: 0,
      expireInSeconds: 60,
      retentionMinutes: 60,
    },
    [JOBS.releaseSweep]: {
      name: JOBS.releaseSweep,
      policy: "singleton",
      retryLimit: 0,
      expireInSeconds: 60,
      retentionMinutes: 60,
    },
  };
}

const state = globalThis as unknown as { yokelineBoss?: Promise<PgBoss> };

/**
 * The one pg-boss of this process, started (kept across hot reloads in development). Its schema
 * comes from our migrations (`migrate: false`); if the database is unreachable the promise
 * rejects and the next call tries again.
 */
export function getBoss(): Promise<PgBoss> {
  state.yokelineBoss ??= startBoss().catch((error: unknown) => {
    state.yokelineBoss = undefined;
    throw error;
  });
  return state.yokelineBoss;
}

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl(),
    schema: "pgboss",
    migrate: false,
    max: envInt("PGBOSS_POOL_MAX", 4),
    application_name: "yokeline-jobs",
  });
  // Without a listener an 'error' event would throw and take the process down.
  boss.on("error", (err) => logger.warn({ err }, "pg-boss error"));
  await boss.start();
  try {
    for (const [name, options] of Object.entries(queueOptions())) {
      if (await boss.getQueue(name)) await boss.updateQueue(name, options);
      else await boss.createQueue(name, options);
    }
  } catch (error) {
    await boss.stop({ graceful: false }).catch(() => {});
    throw error;
  }
  return boss;
}

/** Stops this process's pg-boss (tests, shutdown). */
export async function stopBoss(): Promise<void> {
  const pending = state.yokelineBoss;
  state.yokelineBoss = undefined;
  if (!pending) return;
  const boss = await pending.catch(() => null);
  await boss?.stop({ graceful: true, timeout: 5_000 });
}
