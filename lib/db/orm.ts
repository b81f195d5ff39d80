import "server-only";
import "reflect-metadata";
import { cache } from "react";
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

/** A new entity manager of its own (an empty identity map); never use the global one. */
export async function freshEm(): Promise<EntityManager> {
  return (await getOrm()).em.fork();
}

/**
 * The entity manager of this request. Inside one server render (layouts, pages, generateMetadata,
 * server components) React's `cache()` hands every caller the same fork, so an order loaded for the
 * title and again for the page is one entity. Everywhere else — route handlers, server actions
 * (Next runs them before, not inside, React's render), background jobs, scripts, tests — `cache()`
 * does not memoize and each call gets a fresh fork, as before.
 */
export const getEm: () => Promise<EntityManager> = cache(freshEm);

/** Runs `work` in a transaction (em.transactional: a fork of its own, committed or rolled back). */
export async function inTransaction<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
  const em = await freshEm();
  return em.transactional(work);
}
