import { Entity, Index, ManyToOne, PrimaryKey, Property } from "@mikro-orm/core";
import { User } from "./user.entity";

/** A signed-in browser session (written by the auth library). */
@Entity({ tableName: "auth_session" })
export class Session {
  @PrimaryKey({ type: "text" })
  id!: string;

  @Property({ type: "Date" })
  expiresAt!: Date;

  @Property({ type: "text", unique: true, hidden: true })
  token!: string;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()" })
  updatedAt: Date = new Date();

  @Property({ type: "text", nullable: true })
  ipAddress?: string | null;

  @Property({ type: "text", nullable: true })
  userAgent?: string | null;

  @Index()
  @ManyToOne(() => User, { deleteRule: "cascade" })
  user!: User;
}
