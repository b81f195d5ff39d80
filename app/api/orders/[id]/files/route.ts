import { getEm } from "@/lib/db/orm";
import { readForm } from "@/lib/http/body";
import { AppError } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { loadOrderForUser } from "@/lib/orders/access";
import {
  assertRoomForUpload,
  listOrderUploads,
  mayAttachFiles,
  MAX_UPLOAD_BYTES,
  saveOrderUpload,
  UPLOAD_SIZE_MESSAGE,
} from "@/lib/uploads";

/** Room for the multipart envelope around a file of the largest allowed size. */
const MAX_BODY_BYTES = MAX_UPLOAD_BYTES + 64 * 1024;
const SEND_AS_FORM = "Send the file as multipart/form-data in the field “file”.";

// GET /api/orders/[id]/files — the files attached to an order the caller may see
export const GET = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  const em = await getEm();
  const order = await loadOrderForUser(em, user!, params.id);
  return json({ data: await listOrderUploads(em, order) });
});

// POST /api/orders/[id]/files — attach a photo or measurement sheet (multipart field "file")
export const POST = route<{ id: string }>({ permission: null }, async ({ req, params, user }) => {
  const declared = Number(req.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > MAX_BODY_BYTES) {
    throw new AppError("too_large", UPLOAD_SIZE_MESSAGE, { file: UPLOAD_SIZE_MESSAGE });
  }
  const em = await getEm();
  const order = await loadOrderForUser(em, user!, params.id);
  if (!mayAttachFiles(user!))
    throw new AppError("forbidden", "Only the customer and the counter can attach files to an order.");
  // Refuse before reading megabytes; saveOrderUpload checks again under a lock.
  await assertRoomForUpload(em, order);

  // Read with the cap while streaming (a chunked body has no length to check up front).
  const form = await readForm(req, MAX_BODY_BYTES, {
    field: "file",
    message: SEND_AS_FORM,
    sizeMessage: UPLOAD_SIZE_MESSAGE,
  });
  const file = form.get("file");
  if (!(file instanceof Blob))
    throw new AppError("invalid", "Choose a file to attach.", { file: "Choose a file to attach." });
  if (file.size > MAX_UPLOAD_BYTES)
    throw new AppError("too_large", UPLOAD_SIZE_MESSAGE, { file: UPLOAD_SIZE_MESSAGE });

  const filename = file instanceof File ? file.name : "file";
  const upload = await saveOrderUpload(em, user!, order, {
    filename,
    bytes: new Uint8Array(await file.arrayBuffer()),
  });
  return json({ data: upload }, 201);
});
