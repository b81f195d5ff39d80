import "server-only";
import { LockMode } from "@mikro-orm/core";
import { Design } from "@/entities";
import { AccessError, type CurrentUser } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { isUuid } from "@/lib/http/known-errors";
import { AppError } from "@/lib/http/errors";
import type { RepairBlock, SaveRepairBody, ShaftJob } from "./intake";

export interface RepairView {
  designId: string;
  job: ShaftJob;
  repair: RepairBlock | null;
}

/**
 * The counter records (or clears) the re-tube intake of a draft: a re-tube's weld-to-weld and the
 * parts reused, with who recorded it and when. It changes what the draft is quoted at, so it is
 * audited (before → after). Counter and owner only; an unknown draft is 404.
 */
export async function saveRepairIntake(
  user: CurrentUser,
  designId: string,
  body: SaveRepairBody,
): Promise<RepairView> {
  if (!can(user.role, "orders.desk")) throw new AccessError(403);
  if (!isUuid(designId)) throw new AppError("not_found", "No such design.");
  return inTransaction(async (em) => {
    const draft = await em.findOne(Design, { id: designId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!draft) throw new AppError("not_found", "No such design.");
    const before = draft.repair ?? null;
    const after: RepairBlock | null =
      body.job === "retube"
        ? {
            ...body.repair,
            recordedBy: { id: user.id, name: user.name },
            recordedAt: new Date().toISOString(),
          }
        : null;
    draft.repair = after;
    draft.updatedAt = new Date();
    await recordAudit(
      {
        actorId: user.id,
        action: "design.repair",
        subjectType: "design",
        subjectId: draft.id,
        details: {
          before: before && { weldToWeldMm: before.weldToWeldMm, parts: before.parts },
          after: after && { weldToWeldMm: after.weldToWeldMm, parts: after.parts },
        },
      },
      em,
    );
    await em.flush();
    return { designId: draft.id, job: after ? "retube" : "new", repair: after };
  });
}
