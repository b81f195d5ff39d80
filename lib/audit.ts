import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { AuditEvent, User } from "@/entities";
import { freshEm } from "@/lib/db/orm";

export interface AuditInput {
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId: string;
  details?: Record<string, unknown>;
}

/**
 * Adds a row to the audit log. Pass the caller's entity manager to write it in the same
 * transaction as the change it records; without one it is written on its own.
 */
export async function recordAudit(input: AuditInput, em?: EntityManager): Promise<void> {
  const target = em ?? (await freshEm());
  const event = target.create(AuditEvent, {
    action: input.action,
    subjectType: input.subjectType,
    subjectId: input.subjectId,
    details: input.details ?? null,
    actor: input.actorId ? target.getReference(User, input.actorId) : null,
    at: new Date(),
  });
  target.persist(event);
  if (!em) await target.flush();
}
