"use client";
import { createAuthClient } from "better-auth/react";

/** The browser side of sign-in, sign-up and sign-out (same origin as the app). */
export const authClient = createAuthClient();
