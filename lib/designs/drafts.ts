import "server-only";
import { isUuid } from "@/lib/http/known-errors";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Customer, Design, User } from "@/entities";
import { AccessError, type CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { linkCustomerToUser } from "@/lib/customers";
import { getEm } from "@/lib/db/orm";
import { parseDesign, type Catalogue, type DesignFile } from "@/lib/driveline";
import { AppError, fieldsFromIssues } from "@/lib/http/errors";
import { getShopEngineering } from "@/lib/shop/config";
import { SHAFT_USES, type DesignApplication, type SaveDesignBody, type ShaftUse } from "./schemas";

/** A saved draft as the screens and the API see it (a plain object, never the entity). */
export interface DraftView {
  id: string;
  name: string;
  /** The design file, SI units (engineering contract). */
  design: DesignFile;
  application: DesignApplication;
  customerId: string | null;
  createdAt: string;
  updatedAt: string;
}

/** One row of a draft list. */
export interface DraftSummary {
  id: string;
  name: string;
  lengthMm: number | null;
  use: ShaftUse;
  customerId: string | null;
  updatedAt: string;
}

/** Staff at the counter (orders.desk) see every draft; customers (orders.own) their own; others none. */
function scopeOf(user: CurrentUser): "staff" | "customer" {
  if (can(user.role, "orders.desk")) return "staff";
  if (can(user.role, "orders.own")) return "customer";
  throw new AccessError(403);
}

function applicationOf(d: Design): DesignApplication {
  const use = d.application?.use;
  return {
    description: d.application?.description ?? "",
    use: (SHAFT_USES as readonly string[]).includes(use ?? "") ? (use as ShaftUse) : "street",
  };
}

function customerIdOf(d: Design): string | null {
  const c = d.customer as unknown as { id?: string } | null | undefined;
  return c?.id ?? null;
}

function toView(d: Design): DraftView {
  return {
    id: d.id,
    name: d.name,
    design: d.design as unknown as DesignFile,
    application: applicationOf(d),
    customerId: customerIdOf(d),
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
  };
}

function toSummary(d: Design): DraftSummary {
  const lengthMm = (d.design as { lengthMm?: unknown }).lengthMm;
  return {
    id: d.id,
    name: d.name,
    lengthMm: typeof lengthMm === "number" ? lengthMm : null,
    use: applicationOf(d).use,
    customerId: customerIdOf(d),
    updatedAt: d.updatedAt.toISOString(),
  };
}

/** The design checked by the core against the shop's catalogue; 422 naming each bad field. */
function validDesign(input: unknown, catalogue: Catalogue): DesignFile {
  const parsed = parseDesign(input, { catalogue });
  if (!parsed.ok) {
    throw new AppError(
      "invalid",
      parsed.issues.map((i) => i.message).join("\n"),
      fieldsFromIssues(parsed.issues.map((i) => ({ path: `design.${i.path}`, message: i.message }))),
    );
  }
  return parsed.design;
}

/** Loads a draft the user may see; anything else (absent, someone else's, not an id) is 404. */
async function loadDraft(em: EntityManager, user: CurrentUser, id: string): Promise<Design> {
  const scope = scopeOf(user);
  const draft = isUuid(id)
    ? await em.findOne(Design, scope === "staff" ? { id } : { id, customer: { user: user.id } })
    : null;
  if (!draft) throw new AppError("not_found", "No such design.");
  return draft;
}

/** The customer a new draft belongs to: the caller's own, or (staff) the one named. */
async function customerFor(
  em: EntityManager,
  user: CurrentUser,
  customerId: string | undefined,
): Promise<Customer> {
  if (scopeOf(user) === "staff") {
    if (!customerId)
      throw new AppError("invalid", "customerId: choose the customer this design is for.", {
        customerId: "Required.",
      });
    const customer = await em.findOne(Customer, { id: customerId });
    if (!customer) throw new AppError("not_found", "No such customer.");
    return customer;
  }
  return (await em.findOne(Customer, { user: user.id })) ?? em.merge(await linkCustomerToUser(user));
}

/** The user's drafts, newest first (staff: every draft, or one customer's). */
export async function listDrafts(
  user: CurrentUser,
  filter: { customerId?: string } = {},
): Promise<DraftSummary[]> {
  const scope = scopeOf(user);
  const em = await getEm();
  const where =
    scope === "staff"
      ? filter.customerId
        ? { customer: filter.customerId }
        : {}
      : { customer: { user: user.id } };
  const rows = await em.find(Design, where, { orderBy: { updatedAt: "desc" }, limit: 200 });
  return rows.map(toSummary);
}

/** One draft the user may see (404 otherwise). */
export async function getDraft(user: CurrentUser, id: string): Promise<DraftView> {
  const em = await getEm();
  return toView(await loadDraft(em, user, id));
}

/** One draft the user may see, or null when there is none (for pages that start afresh instead). */
export async function findDraft(user: CurrentUser, id: string | undefined): Promise<DraftView | null> {
  if (!id) return null;
  return getDraft(user, id).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") return null;
    throw error;
  });
}

/** Saves a new draft for the caller (or, staff, for `customerId`). */
export async function createDraft(user: CurrentUser, body: SaveDesignBody): Promise<DraftView> {
  scopeOf(user);
  const { catalogue } = await getShopEngineering();
  const design = validDesign(body.design, catalogue);
  const em = await getEm();
  const customer = await customerFor(em, user, body.customerId);
  const now = new Date();
  const draft = em.create(Design, {
    name: body.name,
    design: design as unknown as Record<string, unknown>,
    application: body.application,
    customer,
    createdBy: em.getReference(User, user.id),
    createdAt: now,
    updatedAt: now,
  });
  await em.persistAndFlush(draft);
  return toView(draft);
}

/** Replaces a draft's name, design and application (404 when not the caller's). */
export async function updateDraft(user: CurrentUser, id: string, body: SaveDesignBody): Promise<DraftView> {
  const { catalogue } = await getShopEngineering();
  const em = await getEm();
  const draft = await loadDraft(em, user, id);
  const design = validDesign(body.design, catalogue);
  draft.name = body.name;
  draft.design = design as unknown as Record<string, unknown>;
  draft.application = body.application;
  if (body.customerId && scopeOf(user) === "staff")
    draft.customer = await customerFor(em, user, body.customerId);
  draft.updatedAt = new Date();
  await em.flush();
  return toView(draft);
}

/** Deletes a draft (404 when not the caller's). */
export async function deleteDraft(user: CurrentUser, id: string): Promise<void> {
  const em = await getEm();
  const draft = await loadDraft(em, user, id);
  await em.removeAndFlush(draft);
}
