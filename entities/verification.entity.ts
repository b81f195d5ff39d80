import { Entity, Index, PrimaryKey, Property } from "@mikro-orm/core";

/** One-time tokens of the auth library (e-mail verification, password reset). */
@Entity({ tableName: "auth_verification" })
export class Verification {
  @PrimaryKey({ type: "text" })
  id!: string;

  @Index()
  @Property({ type: "text" })
  identifier!: string;

  @Property({ type: "text", hidden: true })
  value!: string;

  @Property({ type: "Date" })
  expiresAt!: Date;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();

  @Property({ type: "Date", defaultRaw: "now()" })
  updatedAt: Date = new Date();
}
