import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth/server";
import { FORM_BODY_LIMIT_BYTES, withBodyLimit } from "@/lib/http/body";
import { errorResponse } from "@/lib/http/route";

const handlers = toNextJsHandler(auth);

// GET|POST /api/auth/* — sign-up, sign-in, sign-out and session, handled by the auth library
// (bodies capped while streaming before the library reads them).
export const GET = handlers.GET;
export const POST = withBodyLimit(FORM_BODY_LIMIT_BYTES, handlers.POST, errorResponse);
