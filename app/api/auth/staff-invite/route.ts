import { isSameOriginRequest } from "@/lib/auth/same-origin";
import { AppError } from "@/lib/http/errors";
import { json, parseJson, route } from "@/lib/http/route";
import { acceptStaffInviteBodySchema } from "@/lib/users/schemas";
import { acceptStaffInvitation } from "@/lib/users/invitations";

// POST /api/auth/staff-invite — accept an owner's invitation: choose the password, get signed in
export const POST = route("public", async ({ req }) => {
  if (!isSameOriginRequest(req.headers))
    throw new AppError("forbidden", "Sent from another website; refused.");
  const body = await parseJson(req, acceptStaffInviteBodySchema);
  const { signedIn, home } = await acceptStaffInvitation(body, req.headers);
  const res = json({ ok: true, home }, 201);
  for (const cookie of signedIn.headers.getSetCookie()) res.headers.append("set-cookie", cookie);
  return res;
});
