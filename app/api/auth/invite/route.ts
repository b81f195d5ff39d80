import { acceptInvite } from "@/lib/auth/invite";
import { acceptInviteBodySchema } from "@/lib/auth/schemas";
import { isSameOriginRequest } from "@/lib/auth/same-origin";
import { AppError } from "@/lib/http/errors";
import { json, parseJson, route } from "@/lib/http/route";

// POST /api/auth/invite — accept the counter's invitation: make the account and sign it in
export const POST = route("public", async ({ req }) => {
  if (!isSameOriginRequest(req.headers))
    throw new AppError("forbidden", "Sent from another website; refused.");
  const body = await parseJson(req, acceptInviteBodySchema);
  const signedIn = await acceptInvite(body, req.headers);
  const res = json({ ok: true }, 201);
  for (const cookie of signedIn.headers.getSetCookie()) res.headers.append("set-cookie", cookie);
  return res;
});
