import { Entity, Index, OneToOne, Unique, OptionalProps, PrimaryKey, Property } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { User } from "./user.entity";

/**
 * Someone the shop builds for. A customer who signs up online has a user; one who phones the
 * counter may not (the counter keeps their details here).
 */
@Entity({ tableName: "customer" })
// One customer per e-mail address, whatever its capitals (Migration20261204110000).
@Unique({
  name: "customer_email_lower_unique",
  expression: `create unique index "customer_email_lower_unique" on "customer" (lower(email)) where email <> ''`,
})
// The counter's customer search (lib/customers.ts): trigram indexes for substring matches (Migration20261204150500).
@Index({
  name: "customer_search_trgm_index",
  expression: `create index "customer_search_trgm_index" on "customer" using gin ((lower(name || ' ' || email || ' ' || coalesce(company, '') || ' ' || coalesce(phone, ''))) gin_trgm_ops)`,
})
@Index({
  name: "customer_phone_digits_trgm_index",
  expression: `create index "customer_phone_digits_trgm_index" on "customer" using gin ((regexp_replace(coalesce(phone, ''), '[^0-9]', '', 'g')) gin_trgm_ops)`,
})
// The orders table's search matches customers by name, e-mail or company (Migration20261206100000),
// with no pending list that every search would read through after many inserts (fastupdate off:
// Migration20261207100000).
@Index({
  name: "customer_name_trgm_index",
  expression: `create index "customer_name_trgm_index" on "customer" using gin ("name" gin_trgm_ops) with (fastupdate = off)`,
})
@Index({
  name: "customer_email_trgm_index",
  expression: `create index "customer_email_trgm_index" on "customer" using gin ("email" gin_trgm_ops) with (fastupdate = off)`,
})
@Index({
  name: "customer_company_trgm_index",
  expression: `create index "customer_company_trgm_index" on "customer" using gin ("company" gin_trgm_ops) with (fastupdate = off)`,
})
// The customers table sorts by name, whatever its capitals (Migration20261204150300).
@Index({
  name: "customer_lower_name_index",
  expression: `create index "customer_lower_name_index" on "customer" (lower(name))`,
})
export class Customer {
  [OptionalProps]?: "createdAt";

  @PrimaryKey({ type: "uuid" })
  id: string = randomUUID();

  @Property({ type: "text" })
  name!: string;

  @Index()
  @Property({ type: "text" })
  email!: string;

  @Property({ type: "text", nullable: true })
  phone?: string | null;

  @Property({ type: "text", nullable: true })
  company?: string | null;

  @Property({ type: "text", nullable: true })
  addressLines?: string | null;

  @OneToOne(() => User, { nullable: true, unique: true, deleteRule: "set null" })
  user?: User | null;

  @Property({ type: "Date", defaultRaw: "now()" })
  createdAt: Date = new Date();
}
