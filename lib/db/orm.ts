import "reflect-metadata";
import { MikroORM, type EntityManager } from "@mikro-orm/postgresql";
import config from "@/mikro-orm.config";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { DATABASE_DOWN_MESSAGE } from "@/lib/http/known-errors";

const globalForOrm = globalThis as unknown as { yokelineOrm?: Promise<MikroORM> };

export { DATABASE_DOWN_MESSAGE };

/**
 * The one ORM instance of this process (kept across hot reloads in development). A failed first
 * connection is not kept: the next call tries again, so the app recovers once the database is back.
 * While it is down, callers get an AppError "unavailable" (503).
 */
export function getOrm(): Promise<MikroORM> {
  globalForOrm.yokelineOrm ??= MikroORM.init(config).catch((err: unknown) => {
    globalForOrm.yokelineOrm = undefined;
    logger.warn({ err }, "database not reachable; the next request tries again");
    throw new AppError("unavailable", DATABASE_DOWN_MESSAGE);
  });
  return globalForOrm.yokelineOrm;
}

/** A fresh entity manager for one request or job; never use the global one. */
export async function getEm(): Promise<EntityManager> {
  return (await getOrm()).em.fork();
}

/** Runs `work` in a transaction on a fresh entity manager. */
export async function inTransaction<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
  const em = await getEm();
  return em.transactional(work);
}
