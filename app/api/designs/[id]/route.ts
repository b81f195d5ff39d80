import { deleteDraft, getDraft, updateDraft } from "@/lib/designs/drafts";
import { saveDesignBodySchema } from "@/lib/designs/schemas";
import { json, parseJson, route } from "@/lib/http/route";

type Params = { id: string };

// GET /api/designs/[id] — one of my drafts (404 when it is not mine)
export const GET = route<Params>({ permission: null }, async ({ params, user }) =>
  json(await getDraft(user!, params.id)),
);

// PUT /api/designs/[id] — replace a draft's name, design and application
export const PUT = route<Params>({ permission: null }, async ({ req, params, user }) => {
  const body = await parseJson(req, saveDesignBodySchema);
  return json(await updateDraft(user!, params.id, body));
});

// DELETE /api/designs/[id] — delete a draft
export const DELETE = route<Params>({ permission: null }, async ({ params, user }) => {
  await deleteDraft(user!, params.id);
  return new Response(null, { status: 204 });
});
