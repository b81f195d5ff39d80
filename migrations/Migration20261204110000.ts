import { Migration } from "@mikro-orm/migrations";

/**
 * The database itself refuses impossible money: no negative amounts, a deposit within the total,
 * refunds within what was paid, and never more credited to an order than its total (money paid
 * beyond what is owed is refunded on its payment and never counted as paid on the order).
 * And one customer per e-mail address, whatever its capitals.
 */
export class Migration20261204110000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "shop_order" add constraint "shop_order_money_nonnegative_check" check (subtotal_cents >= 0 and tax_cents >= 0 and shipping_cents >= 0 and total_cents >= 0 and deposit_cents >= 0 and paid_cents >= 0 and refunded_cents >= 0);`,
    );
    this.addSql(
      `alter table "shop_order" add constraint "shop_order_deposit_within_total_check" check (deposit_cents <= total_cents);`,
    );
    this.addSql(
      `alter table "shop_order" add constraint "shop_order_paid_within_total_check" check (paid_cents <= total_cents);`,
    );
    this.addSql(
      `alter table "shop_order" add constraint "shop_order_refunded_within_paid_check" check (refunded_cents <= paid_cents);`,
    );
    this.addSql(
      `alter table "payment" add constraint "payment_amount_positive_check" check (amount_cents > 0);`,
    );
    this.addSql(
      `alter table "payment" add constraint "payment_refunded_within_amount_check" check (refunded_cents >= 0 and refunded_cents <= amount_cents);`,
    );
    this.addSql(
      `alter table "refund" add constraint "refund_amount_positive_check" check (amount_cents > 0);`,
    );
    this.addSql(
      `alter table "order_shaft" add constraint "order_shaft_price_nonnegative_check" check (price_cents >= 0);`,
    );
    this.addSql(
      `create unique index "customer_email_lower_unique" on "customer" (lower(email)) where email <> '';`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index if exists "customer_email_lower_unique";`);
    this.addSql(`alter table "order_shaft" drop constraint if exists "order_shaft_price_nonnegative_check";`);
    this.addSql(`alter table "refund" drop constraint if exists "refund_amount_positive_check";`);
    this.addSql(`alter table "payment" drop constraint if exists "payment_refunded_within_amount_check";`);
    this.addSql(`alter table "payment" drop constraint if exists "payment_amount_positive_check";`);
    this.addSql(
      `alter table "shop_order" drop constraint if exists "shop_order_refunded_within_paid_check";`,
    );
    this.addSql(`alter table "shop_order" drop constraint if exists "shop_order_paid_within_total_check";`);
    this.addSql(
      `alter table "shop_order" drop constraint if exists "shop_order_deposit_within_total_check";`,
    );
    this.addSql(`alter table "shop_order" drop constraint if exists "shop_order_money_nonnegative_check";`);
  }
}
