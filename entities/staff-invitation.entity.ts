import { Entity, Enum, Index, ManyToOne, OptionalProps, PrimaryKey, Property, Unique } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { ROLES, type StaffRole } from "../lib/auth/roles";
import { User } from "./user.entity";

/**
 * An owner's invitation to join the staff (or the first owner's link from `npm run owner:create`).
 * Only the SHA-256 of the link's token is kept; the link works once, until `expiresAt`.
 */
@Entity({ tableName: "staff_invitation" })
// At most one open invitation per address, whatever its capitals (Migration20261204150600).
@Unique({
  name: "staff_invitation_open_email_unique",
  expression: `create unique index "staff_invitation_open_email_unique" on "staff_invitation" (lower(email)) where accepted_at is null and revoked_at is null`,
})
export class StaffInvitation {
  [OptionalProps]?: "createdAt" | "sendCount";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Property({ type: "text" })
  email!: string;

  @Property({ type: "text" })
  name!: string;

  /** Never "customer" (lib/users/invitations.ts checks); the column shares the users' enum type. */
  @Enum({ items: () => ROLES, nativeEnumName: "user_role" })
  role!: StaffRole;

  @Property({ type: "text", unique: true, hidden: true })
  tokenHash!: string;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  invitedBy?: User | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  /** When the newest link was made (and e-mailed, unless it is the first owner's printed link). */
  @Property({ type: "Date" })
  sentAt!: Date;

  @Property({ type: "int", default: 1 })
  sendCount: number = 1;

  @Index()
  @Property({ type: "Date" })
  expiresAt!: Date;

  @Property({ type: "Date", nullable: true })
  acceptedAt?: Date | null;

  /** The account the invitation made. */
  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  user?: User | null;

  @Property({ type: "Date", nullable: true })
  revokedAt?: Date | null;

  @ManyToOne(() => User, { nullable: true, deleteRule: "set null" })
  revokedBy?: User | null;
}
