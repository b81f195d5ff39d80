import { Entity, PrimaryKey, Property } from "@mikro-orm/core";

/** Failed password attempts per e-mail address, whatever address they come from (lib/auth/sign-in-lock.ts). */
@Entity({ tableName: "auth_sign_in_failure" })
export class SignInFailure {
  /** Lower-cased e-mail as typed; also for addresses without an account, so a lock says nothing. */
  @PrimaryKey({ type: "text" })
  email!: string;

  @Property({ type: "integer" })
  failures!: number;

  @Property({ type: "timestamptz" })
  firstFailedAt!: Date;

  @Property({ type: "timestamptz", nullable: true })
  lockedUntil?: Date | null;
}
