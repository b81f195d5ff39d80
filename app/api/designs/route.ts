import { createDraft, listDrafts } from "@/lib/designs/drafts";
import { listDesignsQuerySchema, saveDesignBodySchema } from "@/lib/designs/schemas";
import { json, parseJson, route } from "@/lib/http/route";

// Customers (orders.own) work on their own drafts; the counter (orders.desk) on anyone's.
// The service decides which of the two the caller is, so the wrapper only needs a session.

// GET /api/designs — list my drafts (staff: all, or ?customerId=)
export const GET = route({ permission: null }, async ({ req, user }) => {
  const query = listDesignsQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return json({ drafts: await listDrafts(user!, query) });
});

// POST /api/designs — save a new draft
export const POST = route({ permission: null }, async ({ req, user }) => {
  const body = await parseJson(req, saveDesignBodySchema);
  return json(await createDraft(user!, body), 201);
});
