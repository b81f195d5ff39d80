/**
 * Engineering sign-off at ordering (pure, used by the server and the screens): which checks of an
 * evaluation must be acknowledged before a design is ordered, and when an ordered shaft waits for
 * the owner's engineering sign-off.
 */

export interface CheckLike {
  id: string;
  status: string;
  message: string;
}

/** One check to acknowledge, keyed by id (a check id repeated in a report is acknowledged once). */
export interface AckItem {
  checkId: string;
  status: "warn" | "fail";
  message: string;
}

/** The warnings of an evaluation's checks, one per check id. */
export function warningsToAcknowledge(checks: readonly CheckLike[]): AckItem[] {
  return byId(checks, "warn");
}

/** The failed checks of an evaluation, one per check id. */
export function failedChecks(checks: readonly CheckLike[]): AckItem[] {
  return byId(checks, "fail");
}

function byId(checks: readonly CheckLike[], status: "warn" | "fail"): AckItem[] {
  const out = new Map<string, AckItem>();
  for (const c of checks) {
    if (c.status !== status) continue;
    const seen = out.get(c.id);
    if (seen) seen.message = `${seen.message}; ${c.message}`;
    else out.set(c.id, { checkId: c.id, status, message: c.message });
  }
  return [...out.values()];
}

/** The items of `required` whose check id is not among `acknowledged`. */
export function missingAcknowledgements(
  required: readonly AckItem[],
  acknowledged: readonly string[],
): AckItem[] {
  const given = new Set(acknowledged);
  return required.filter((r) => !given.has(r.checkId));
}

/**
 * A shaft needs the owner's engineering sign-off while its frozen evaluation has a check that fails
 * and is not among the owner's accepted failed checks (shared contract of issue 9).
 */
export function needsEngineeringSignoff(
  checks: readonly CheckLike[],
  acceptances: readonly { checkId: string }[] = [],
): boolean {
  const accepted = new Set(acceptances.map((a) => a.checkId));
  return checks.some((c) => c.status === "fail" && !accepted.has(c.id));
}
