import type { Role } from "./roles";

export interface CurrentUser {
  id: string;
  name: string;
  email: string;
  role: Role;
}

/** Thrown when a caller is not signed in (401) or not allowed (403). */
export class AccessError extends Error {
  constructor(readonly status: 401 | 403) {
    super(status === 401 ? "Sign in to continue." : "You do not have access to this.");
  }
}
