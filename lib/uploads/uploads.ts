import "server-only";
import { isUuid } from "@/lib/http/known-errors";
import { createHash } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { fileTypeFromBuffer } from "file-type";
import { Order, OrderEvent, Upload, User } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/http/errors";
import { logger } from "@/lib/logger";
import { getStorage, newStorageKey } from "@/lib/storage";
import {
  ALLOWED_UPLOAD_TYPES,
  formatBytes,
  MAX_UPLOAD_BYTES,
  UPLOAD_SIZE_MESSAGE,
  UPLOAD_TYPE_MESSAGE,
  type UploadView,
} from "./rules";
import { assertRoomForUpload } from "./limits";

export interface IncomingFile {
  /** The name on the uploader's machine; only shown, never used as a path. */
  filename: string;
  bytes: Uint8Array;
}

/** A file name fit to show: no folders, no control characters, at most 200 characters. */
export function displayFilename(raw: string): string {
  const base = raw.split(/[\\/]/).pop() ?? "";
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, "").trim();
  return (clean || "file").slice(0, 200);
}

/** The content type sniffed from the bytes, if it is one we accept (never the browser's word). */
export async function sniffUploadType(
  bytes: Uint8Array,
): Promise<(typeof ALLOWED_UPLOAD_TYPES)[number] | null> {
  const found = await fileTypeFromBuffer(bytes);
  const mime = found?.mime as string | undefined;
  return ALLOWED_UPLOAD_TYPES.find((t) => t === mime) ?? null;
}

export function toUploadView(upload: Upload): UploadView {
  const uploader = upload.uploadedBy;
  return {
    id: upload.id,
    filename: upload.filename,
    contentType: upload.contentType,
    kind: upload.contentType === "application/pdf" ? "pdf" : "image",
    sizeBytes: upload.sizeBytes,
    createdAt: upload.createdAt.toISOString(),
    uploadedBy: uploader && "name" in uploader && typeof uploader.name === "string" ? uploader.name : null,
    url: `/api/files/${upload.id}`,
  };
}

/**
 * Attaches a photo or measurement sheet to an order the caller may already see (load it with
 * loadOrderForUser). Checks size (413) and the sniffed type (422 on "file"), stores the bytes
 * under a fresh key, then — after the file limits (409/429), under a lock — writes the Upload row,
 * a timeline event and an audit entry together.
 */
export async function saveOrderUpload(
  em: EntityManager,
  user: CurrentUser,
  order: Order,
  file: IncomingFile,
): Promise<UploadView> {
  if (file.bytes.byteLength > MAX_UPLOAD_BYTES) {
    throw new AppError(
      "too_large",
      `${UPLOAD_SIZE_MESSAGE} This one is ${formatBytes(file.bytes.byteLength)}.`,
      { file: UPLOAD_SIZE_MESSAGE },
    );
  }
  if (file.bytes.byteLength === 0)
    throw new AppError("invalid", "The file is empty.", { file: "The file is empty." });
  const contentType = await sniffUploadType(file.bytes);
  if (!contentType) throw new AppError("invalid", UPLOAD_TYPE_MESSAGE, { file: UPLOAD_TYPE_MESSAGE });

  const filename = displayFilename(file.filename);
  const sha256 = createHash("sha256").update(file.bytes).digest("hex");
  const storageKey = newStorageKey();
  const storage = getStorage();
  await storage.put(storageKey, file.bytes, contentType);
  try {
    const upload = await em.transactional(async (tx) => {
      await assertRoomForUpload(tx, order, { lock: true });
      const row = tx.create(Upload, {
        order: tx.getReference(Order, order.id),
        uploadedBy: tx.getReference(User, user.id),
        filename,
        contentType,
        sizeBytes: file.bytes.byteLength,
        storageKey,
        sha256,
        createdAt: new Date(),
      });
      const label =
        contentType === "application/pdf" ? `File added: ${filename}` : `Photo added: ${filename}`;
      tx.create(OrderEvent, {
        order: tx.getReference(Order, order.id),
        kind: "file",
        label,
        public: true,
        actor: tx.getReference(User, user.id),
        at: new Date(),
      });
      await recordAudit(
        {
          actorId: user.id,
          action: "order.file.add",
          subjectType: "order",
          subjectId: order.id,
          details: { uploadId: row.id, filename, contentType, sizeBytes: row.sizeBytes, sha256 },
        },
        tx,
      );
      return row;
    });
    return { ...toUploadView(upload), uploadedBy: user.name };
  } catch (error) {
    // The row never made it: do not leave the bytes behind.
    await storage
      .delete(storageKey)
      .catch((err: unknown) => logger.warn({ err, storageKey }, "could not remove orphaned upload"));
    throw error;
  }
}

/** The files attached to an order, oldest first. */
export async function listOrderUploads(em: EntityManager, order: Order): Promise<UploadView[]> {
  const rows = await em.find(
    Upload,
    { order: order.id },
    { orderBy: { createdAt: "asc" }, populate: ["uploadedBy"] },
  );
  return rows.map(toUploadView);
}

/** An upload together with the id of its order, for the access check; null when absent. */
export async function findUpload(em: EntityManager, uploadId: string): Promise<Upload | null> {
  if (!isUuid(uploadId)) return null;
  return em.findOne(Upload, { id: uploadId });
}

/** Customers (their own orders, via loadOrderForUser) and the counter may attach files; the floor only looks. */
export function mayAttachFiles(user: CurrentUser): boolean {
  return can(user.role, "orders.desk") || can(user.role, "orders.own");
}

/** `Content-Disposition` for showing a file in the browser under its original name (RFC 6266 / 5987). */
export function inlineDisposition(filename: string): string {
  return disposition("inline", filename);
}

/** `Content-Disposition` for downloading a file under its original name (RFC 6266 / 5987). */
export function attachmentDisposition(filename: string): string {
  return disposition("attachment", filename);
}

function disposition(kind: "inline" | "attachment", filename: string): string {
  const ascii = filename.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  const encoded = encodeURIComponent(filename).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
