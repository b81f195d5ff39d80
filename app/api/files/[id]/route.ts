import { getEm } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { logger } from "@/lib/logger";
import { loadOrderForUser } from "@/lib/orders/access";
import { getStorage } from "@/lib/storage";
import { attachmentDisposition, FILE_CSP, findUpload, inlineDisposition } from "@/lib/uploads";

// GET /api/files/[id] — the bytes of an attached file, only to those who may see its order (others 404)
export const GET = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  const em = await getEm();
  const upload = await findUpload(em, params.id);
  if (!upload) throw new AppError("not_found", "No such file.");
  // Not allowed to see the order → the same 404 as a file that does not exist.
  await loadOrderForUser(em, user!, upload.order.id).catch((error: unknown) => {
    throw error instanceof AppError && error.code === "not_found"
      ? new AppError("not_found", "No such file.")
      : error;
  });
  const stored = await getStorage().get(upload.storageKey);
  if (!stored) {
    logger.error({ uploadId: upload.id, storageKey: upload.storageKey }, "upload row without stored bytes");
    throw new AppError("not_found", "No such file.");
  }
  return new Response(stored.stream, {
    status: 200,
    headers: {
      // The type we sniffed when it was uploaded, never the browser's.
      "Content-Type": upload.contentType,
      "Content-Length": String(stored.sizeBytes),
      // Photos show inline; PDFs (which can carry scripts and forms) are downloaded, since
      // Chromium's viewer will not run in a sandboxed document.
      "Content-Disposition":
        upload.contentType === "application/pdf"
          ? attachmentDisposition(upload.filename)
          : inlineDisposition(upload.filename),
      // Opened directly, the file is its own sandboxed document: no scripts, no same-origin access.
      "Content-Security-Policy": FILE_CSP,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, max-age=300",
    },
  });
});
