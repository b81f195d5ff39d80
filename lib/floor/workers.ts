import "server-only";
import type PgBoss from "pg-boss";
import { JOBS } from "@/lib/jobs/boss";
import { releasePaidOrders } from "./release-sweep";

const registered = new WeakSet<PgBoss>();

/** Registers the once-a-minute release sweep on a started pg-boss (once per instance). */
export async function registerFloorWorkers(boss: PgBoss): Promise<void> {
  if (registered.has(boss)) return;
  registered.add(boss);
  await boss.work(JOBS.releaseSweep, { pollingIntervalSeconds: 5 }, async () => {
    await releasePaidOrders();
  });
  await boss.schedule(JOBS.releaseSweep, "* * * * *");
}
