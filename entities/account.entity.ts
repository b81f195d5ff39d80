import { Entity, Index, ManyToOne, PrimaryKey, Property } from "@mikro-orm/core";
import { User } from "./user.entity";

/** A credential of a user (password hash for e-mail sign-in); written by the auth library. */
@Entity({ tableName: "auth_account" })
export class Account {
  @PrimaryKey({ type: "text" })
  id!: string;

  @Property({ type: "text" })
  accountId!: string;

  @Property({ type: "text" })
  providerId!: string;

  @Index()
  @ManyToOne(() => User, { deleteRule: "cascade" })
  user!: User;

  @Property({ type: "text", nullable: true, hidden: true })
  accessToken?: string | null;

  @Property({ type: "text", nullable: true, hidden: true })
  refreshToken?: string | null;

  @Property({ type: "text", nullable: true, hidden: true })
  idToken?: string | null;

  @Property({ type: "Date", nullable: true })
  accessTokenExpiresAt?: Date | null;

  @Property({ type: "Date", nullable: true })
  refreshTokenExpiresAt?: Date | null;

  @Property({ type: "text", nullable: true })
  scope?: string | null;

  @Property({ type: "text", nullable: true, hidden: true })
  password?: string | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()" })
  updatedAt: Date = new Date();
}
