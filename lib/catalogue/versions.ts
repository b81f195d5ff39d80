import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { AuditEvent, ShopConfig, ShopConfigVersion, User } from "@/entities";
import type { CurrentUser } from "@/lib/auth/access";
import { recordAudit } from "@/lib/audit";
import { getEm, inTransaction } from "@/lib/db/orm";
import { defaultCatalogue } from "@/lib/driveline";
import { AppError } from "@/lib/http/errors";
import { defaultPriceBook } from "@/lib/pricing/price-book";
import { invalidateShopEngineering } from "@/lib/shop/config";
import { diffConfig, type ConfigChange } from "./diff";
import { toEditable, toStored, type StoredShopConfig } from "./documents";
import { fieldErrors, saveShopConfigBodySchema, type ShopConfigDocument } from "./schemas";

/** The audit action of a save (subject: shop_config, id: the new version number). */
export const SAVE_ACTION = "shop.config.save";

/** Serialises saves (and a first save's creation of the row). */
const SAVE_LOCK = 7302;

const DEFAULT_STORED: StoredShopConfig = {
  catalogue: defaultCatalogue,
  settings: {},
  priceBook: defaultPriceBook,
  floor: {},
};

const storedOf = (row: ShopConfig | null): StoredShopConfig =>
  row
    ? { catalogue: row.catalogue, settings: row.settings, priceBook: row.priceBook, floor: row.floor }
    : DEFAULT_STORED;

/** "2026-12-04 15:32 UTC" */
const when = (d: Date) => `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;

/** What the owner's editor opens with: the current version, every figure resolved. */
export async function currentShopConfig(em?: EntityManager): Promise<{
  version: number;
  document: ShopConfigDocument;
}> {
  const row = await (em ?? (await getEm())).findOne(ShopConfig, { id: 1 });
  return { version: row?.version ?? 1, document: toEditable(storedOf(row)) };
}

export interface SavedVersion {
  version: number;
  changes: ConfigChange[];
}

/**
 * Saves the owner's edited configuration as a new version, if it is valid, differs from the
 * current one and was based on it (409 naming who saved in between otherwise). The new version
 * becomes what quotes, the builder and new orders use; placed orders keep their frozen copies.
 * Audited with every changed field, before → after.
 */
export async function saveShopConfig(user: CurrentUser, input: unknown): Promise<SavedVersion> {
  const parsed = saveShopConfigBodySchema.safeParse(input);
  if (!parsed.success) {
    const fields = fieldErrors(parsed.error);
    const [first] = Object.entries(fields);
    const more = Object.keys(fields).length - 1;
    throw new AppError(
      "invalid",
      `Nothing was saved. ${first![0]}: ${first![1]}${more > 0 ? ` (and ${more} more)` : ""}.`,
      fields,
    );
  }
  const { basedOnVersion, note, ...doc } = parsed.data;
  const next = toStored(doc);

  const saved = await inTransaction(async (em) => {
    await em
      .getConnection()
      .execute(`select pg_advisory_xact_lock(${SAVE_LOCK})`, [], "all", em.getTransactionContext());
    const row = await em.findOne(ShopConfig, { id: 1 });
    const current = row?.version ?? 1;
    if (basedOnVersion !== current) {
      const newer = await em.findOne(ShopConfigVersion, { version: current });
      const who = newer
        ? `${newer.createdByName} saved version ${current} at ${when(newer.createdAt)} (“${newer.note}”)`
        : `Version ${current} is now current`;
      throw new AppError(
        "conflict",
        `${who} after you opened version ${basedOnVersion}. Nothing was saved and your changes are still in the form: open the catalogue again in a new tab to see version ${current}, then make your changes on top of it.`,
      );
    }

    const stored = storedOf(row);
    const changes = diffConfig(toEditable(stored), toEditable(next));
    if (changes.length === 0)
      throw new AppError("invalid", `Nothing to save: every value is the same as in version ${current}.`);

    // The starting configuration (seeded, or the built-in defaults) becomes version 1 at the first save.
    if (!(await em.findOne(ShopConfigVersion, { version: current }))) {
      em.create(ShopConfigVersion, {
        version: current,
        ...stored,
        note: "Starting configuration",
        createdBy: null,
        createdByName: "Yokeline setup",
        createdAt: row?.updatedAt ?? new Date(),
      });
    }
    const version = current + 1;
    if (row) em.assign(row, { ...next, version });
    else em.create(ShopConfig, { id: 1, ...next, version });
    em.create(ShopConfigVersion, {
      version,
      ...next,
      note,
      createdBy: em.getReference(User, user.id),
      createdByName: user.name,
    });
    await recordAudit(
      {
        actorId: user.id,
        action: SAVE_ACTION,
        subjectType: "shop_config",
        subjectId: String(version),
        details: { version, basedOnVersion, note, changes },
      },
      em,
    );
    return { version, changes };
  });
  invalidateShopEngineering();
  return saved;
}

export interface VersionView {
  version: number;
  note: string;
  by: string;
  /** ISO time */
  at: string;
  current: boolean;
  changes: ConfigChange[];
}

/** The newest versions with what each changed (from the audit log), newest first. */
export async function versionHistory(limit = 20, em?: EntityManager): Promise<VersionView[]> {
  const db = em ?? (await getEm());
  const [rows, config] = await Promise.all([
    db.find(
      ShopConfigVersion,
      {},
      { orderBy: { version: "desc" }, limit, fields: ["version", "note", "createdByName", "createdAt"] },
    ),
    db.findOne(ShopConfig, { id: 1 }, { fields: ["version"] }),
  ]);
  const audits = rows.length
    ? await db.find(AuditEvent, {
        action: SAVE_ACTION,
        subjectType: "shop_config",
        subjectId: { $in: rows.map((r) => String(r.version)) },
      })
    : [];
  const changesOf = new Map(
    audits.map((a) => [a.subjectId, (a.details?.changes as ConfigChange[] | undefined) ?? []]),
  );
  return rows.map((r) => ({
    version: r.version,
    note: r.note,
    by: r.createdByName,
    at: r.createdAt.toISOString(),
    current: r.version === (config?.version ?? 1),
    changes: changesOf.get(String(r.version)) ?? [],
  }));
}
