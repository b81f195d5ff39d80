import { Entity, Enum, PrimaryKey, Property } from "@mikro-orm/core";
import { ROLES, type Role } from "../lib/auth/roles";

/** A person who signs in. The auth library writes this table; the app reads it and links to it. */
@Entity({ tableName: "app_user" })
export class User {
  @PrimaryKey({ type: "text" })
  id!: string;

  @Property({ type: "text" })
  name!: string;

  @Property({ type: "text", unique: true })
  email!: string;

  @Property({ type: "boolean", default: false })
  emailVerified: boolean = false;

  @Property({ type: "text", nullable: true })
  image?: string | null;

  @Enum({ items: () => ROLES, nativeEnumName: "user_role", default: "customer" })
  role: Role = "customer";

  /** Set by an owner: no sign-in, no sessions (lib/users/staff.ts). */
  @Property({ type: "Date", nullable: true })
  deactivatedAt?: Date | null;

  /** The newest session's start (lib/auth/server.ts), for the staff table. */
  @Property({ type: "Date", nullable: true })
  lastSignInAt?: Date | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()", onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
