import "reflect-metadata";
import { MikroORM, type EntityManager } from "@mikro-orm/postgresql";
import config from "@/mikro-orm.config";

const globalForOrm = globalThis as unknown as { yokelineOrm?: Promise<MikroORM> };

/** The one ORM instance of this process (kept across hot reloads in development). */
export function getOrm(): Promise<MikroORM> {
  globalForOrm.yokelineOrm ??= MikroORM.init(config);
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
