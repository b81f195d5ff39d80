import { Entity, PrimaryKey, Property } from "@mikro-orm/core";

/** Request counters of the auth library's rate limiter, kept in the database so every app instance shares them. */
@Entity({ tableName: "auth_rate_limit" })
export class RateLimit {
  @PrimaryKey({ type: "text" })
  id!: string;

  @Property({ type: "text", unique: true })
  key!: string;

  @Property({ type: "integer" })
  count!: number;

  @Property({ type: "bigint" })
  lastRequest!: number;
}
