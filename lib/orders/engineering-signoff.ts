import "server-only";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Order, OrderEvent, OrderShaft, User, type FailedCheckAcceptance } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import type { AcceptedException } from "@/lib/traveller/view";
import { needsEngineeringSignoff, type CheckLike } from "./acknowledgements";

import { ACCEPTANCE_REASON_MIN_CHARS } from "./desk-schemas";

type FrozenCheck = CheckLike;

type ShaftLike = Pick<OrderShaft, "evaluation" | "failedCheckAcceptances">;

/** The checks of a shaft's frozen evaluation (as stored with the order). */
export function frozenChecks(shaft: Pick<OrderShaft, "evaluation">): FrozenCheck[] {
  const checks = (shaft.evaluation as { checks?: unknown }).checks;
  if (!Array.isArray(checks)) return [];
  return checks.filter(
    (c): c is FrozenCheck => typeof c === "object" && c !== null && typeof (c as FrozenCheck).id === "string",
  );
}

/** The frozen evaluation's failed checks that no owner has accepted for this shaft. */
export function pendingFailedChecks(shaft: ShaftLike): FrozenCheck[] {
  const accepted = new Set((shaft.failedCheckAcceptances ?? []).map((a) => a.checkId));
  return frozenChecks(shaft).filter((c) => c.status === "fail" && !accepted.has(c.id));
}

/** A shaft "needs engineering sign-off" while a failed check of its frozen evaluation is not accepted. */
export function needsSignoff(shaft: ShaftLike): boolean {
  return needsEngineeringSignoff(frozenChecks(shaft), shaft.failedCheckAcceptances ?? []);
}

/** The failed checks an owner accepted for a shaft, as the traveller prints them. */
export function acceptedExceptions(shaft: ShaftLike): AcceptedException[] {
  const checks = frozenChecks(shaft);
  return (shaft.failedCheckAcceptances ?? []).map((a) => ({
    checkId: a.checkId,
    message: checks.find((c) => c.id === a.checkId)?.message ?? a.checkId,
    reason: a.reason,
    byName: a.byName,
    at: a.at,
  }));
}

/** What the desk shows of one shaft's failed checks: each with its acceptance, if any. */
export interface SignoffShaftView {
  shaftId: string;
  position: number;
  name: string;
  failed: {
    checkId: string;
    message: string;
    acceptance: { reason: string; byName: string; at: string } | null;
  }[];
}

export function signoffView(shafts: readonly OrderShaft[]): SignoffShaftView[] {
  return shafts
    .map((s) => ({
      shaftId: s.id,
      position: s.position,
      name: s.name,
      failed: frozenChecks(s)
        .filter((c) => c.status === "fail")
        .map((c) => {
          const a = (s.failedCheckAcceptances ?? []).find((x) => x.checkId === c.id);
          return {
            checkId: c.id,
            message: c.message,
            acceptance: a ? { reason: a.reason, byName: a.byName, at: a.at } : null,
          };
        }),
    }))
    .filter((s) => s.failed.length > 0);
}

/**
 * Refuses `what` (a payment or the release) while any shaft of the order fails a check no owner
 * has accepted. Call it under the order's row lock, in the transaction that does the work.
 */
export async function assertSignedOff(em: EntityManager, order: Order, what: string): Promise<void> {
  const shafts = await em.find(OrderShaft, { order: order.id }, { orderBy: { position: "asc" } });
  const pending = shafts.flatMap((s) => pendingFailedChecks(s).map((c) => `${s.name}: ${c.message}`));
  if (pending.length === 0) return;
  throw new AppError(
    "conflict",
    `Order ${order.number} needs engineering sign-off: an owner must review the failed check${pending.length > 1 ? "s" : ""} (${pending.join("; ")}) before ${what}.`,
  );
}

/**
 * An owner accepts one failed check for one order shaft, with a written reason. The acceptance
 * is stored on the shaft, audited, noted on the order (staff only) and printed on the traveller.
 * The shop's limits and the frozen evaluation are unchanged: the check still reads "fail".
 */
export async function acceptFailedCheck(
  user: CurrentUser,
  input: { orderId: string; shaftId: string; checkId: string; reason: string },
): Promise<FailedCheckAcceptance> {
  if (!can(user.role, "engineering.signoff"))
    throw new AppError("forbidden", "Only an owner can accept a failed engineering check.");
  const reason = input.reason.trim();
  if (reason.length < ACCEPTANCE_REASON_MIN_CHARS)
    throw new AppError("invalid", "Write why this check does not apply to this order.", {
      reason: `At least ${ACCEPTANCE_REASON_MIN_CHARS} characters.`,
    });
  return inTransaction(async (em) => {
    const order = await em.findOne(
      Order,
      { id: input.orderId },
      { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
    );
    if (!order) throw new AppError("not_found", "No such order.");
    if (order.status === "cancelled")
      throw new AppError("conflict", `Order ${order.number} is cancelled; nothing to sign off.`);
    const shaft = await em.findOne(OrderShaft, { id: input.shaftId, order: order.id }, { refresh: true });
    if (!shaft) throw new AppError("not_found", "No such shaft on this order.");
    const check = frozenChecks(shaft).find((c) => c.id === input.checkId);
    if (!check || check.status !== "fail")
      throw new AppError("invalid", "That check did not fail on this shaft.", {
        checkId: "not a failed check of this shaft",
      });
    const before = shaft.failedCheckAcceptances ?? [];
    if (before.some((a) => a.checkId === check.id))
      throw new AppError("conflict", `The check "${check.message}" is already accepted for this shaft.`);
    const author = await em.findOneOrFail(User, { id: user.id });
    const acceptance: FailedCheckAcceptance = {
      checkId: check.id,
      reason,
      byUserId: user.id,
      byName: author.name,
      at: new Date().toISOString(),
    };
    shaft.failedCheckAcceptances = [...before, acceptance];
    em.create(OrderEvent, {
      order,
      kind: "note",
      label: `${author.name} accepted the failed check on ${shaft.name} (${check.message}): ${reason}`,
      public: false,
      actor: author,
      at: new Date(),
    });
    await recordAudit(
      {
        actorId: user.id,
        action: "engineering.accept-failed-check",
        subjectType: "order",
        subjectId: order.id,
        details: {
          shaftId: shaft.id,
          checkId: check.id,
          message: check.message,
          reason,
          before: before.map((a) => a.checkId),
          after: shaft.failedCheckAcceptances.map((a) => a.checkId),
        },
      },
      em,
    );
    return acceptance;
  });
}
