import "server-only";
import { logger } from "@/lib/logger";
import { registerFloorWorkers } from "@/lib/floor/workers";
import { startMailWorkers } from "@/lib/mail/workers";

const state = globalThis as unknown as { yokelineJobsStarting?: boolean };

/**
 * Starts the background jobs of the app server. Never throws: when the database is not reachable
 * yet it logs and tries again with a growing delay (up to a minute), so the app keeps serving.
 */
export function startBackgroundJobs(): void {
  if (state.yokelineJobsStarting) return;
  state.yokelineJobsStarting = true;
  let delayMs = 2_000;
  const attempt = async (): Promise<void> => {
    try {
      await registerFloorWorkers(await startMailWorkers());
      logger.info("background jobs started (mail.deliver, mail.sweep, floor.release-sweep)");
    } catch (err) {
      logger.warn({ err, retryInMs: delayMs }, "could not start background jobs; trying again");
      setTimeout(() => void attempt(), delayMs).unref();
      delayMs = Math.min(delayMs * 2, 60_000);
    }
  };
  void attempt();
}
