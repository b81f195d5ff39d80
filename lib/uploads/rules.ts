/** What may be attached to an order; shared by the server check and the upload control (no I/O here). */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

/** Content types we accept, as sniffed from the bytes. */
export const ALLOWED_UPLOAD_TYPES = [
  "image/jpeg",
  "image/png",
  "image/webp",
  "image/heic",
  "image/heif",
  "application/pdf",
] as const;
export type UploadContentType = (typeof ALLOWED_UPLOAD_TYPES)[number];

export const UPLOAD_ACCEPT = "image/*,application/pdf";
export const UPLOAD_TYPE_MESSAGE = "Only photos (JPEG, PNG, WebP, HEIC) and PDF files can be attached.";
export const UPLOAD_SIZE_MESSAGE = "Files can be at most 10 MB.";

/** One attached file as the browser gets it. */
export interface UploadView {
  id: string;
  filename: string;
  contentType: string;
  kind: "image" | "pdf";
  sizeBytes: number;
  /** ISO 8601. */
  createdAt: string;
  uploadedBy: string | null;
  /** Where the bytes are served (only to those who may see the order). */
  url: string;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Most files one order can carry (photos of each end, measurement sheets, a few spares). */
export const MAX_FILES_PER_ORDER = 20;
/** Most files attached to one customer's orders in 24 hours (keeps a runaway script off the disk). */
export const MAX_FILES_PER_CUSTOMER_PER_DAY = 30;
export const ORDER_FILES_LIMIT_MESSAGE = `An order can have at most ${MAX_FILES_PER_ORDER} files attached.`;
export const DAILY_FILES_LIMIT_MESSAGE = `At most ${MAX_FILES_PER_CUSTOMER_PER_DAY} files a day can be attached to one customer's orders; try again tomorrow.`;

/**
 * Served with every attached file: a document of its own, sandboxed (no scripts, no forms, an
 * opaque origin), that may show only itself — an image still displays inline.
 */
export const FILE_CSP = "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'";
