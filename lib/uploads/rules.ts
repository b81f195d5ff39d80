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
