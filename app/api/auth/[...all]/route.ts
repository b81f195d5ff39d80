import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth/server";

// GET|POST /api/auth/* — sign-up, sign-in, sign-out and session, handled by the auth library
export const { GET, POST } = toNextJsHandler(auth);
