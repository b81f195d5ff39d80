import "server-only";
import { Customer, Design } from "@/entities";
import { getEm } from "@/lib/db/orm";
import type { CurrentUser } from "@/lib/auth/guard";
import { seesAllOrders } from "./access";
import { shaftView, type ShaftView } from "./queries";
import { quoteDesigns } from "./place-order";
import { getShopEngineering } from "@/lib/shop/config";
import { AppError } from "@/lib/http/errors";
import { quoteOrder, type OrderQuote } from "@/lib/pricing/price-book";
import { retubeGeometryOf, type RetubeGeometry } from "@/lib/retube/intake";

export interface QuotePageData {
  designIds: string[];
  customer: { id: string; name: string; email: string };
  shafts: ShaftView[];
  pickup: OrderQuote;
  ship: OrderQuote;
  depositPercent: number;
  leadTimeWorkingDays: number;
  failing: string[];
  /** Per shaft: what the counter's re-tube cross-check needs (lib/retube/intake.ts retubeLengthCheck). */
  retubeGeometries: RetubeGeometry[];
  /** The customer's other saved designs, which can be added to the same order. */
  others: { id: string; name: string }[];
}

/** Prices saved designs for the quote screen, exactly as placing the order will. */
export async function quoteForDesigns(
  user: CurrentUser,
  designIds: string[],
  customerId?: string,
): Promise<QuotePageData> {
  const em = await getEm();
  const customer =
    seesAllOrders(user) && customerId
      ? await em.findOne(Customer, { id: customerId })
      : await em.findOne(Customer, { user: user.id });
  if (!customer) throw new AppError("not_found", "No such customer.");
  const designs = await em.find(Design, { id: { $in: designIds }, customer });
  if (designs.length === 0 || designs.length !== new Set(designIds).size)
    throw new AppError("not_found", "That design is not yours or no longer exists.");
  const shop = await getShopEngineering();
  const ordered = designIds.map((id) => designs.find((d) => d.id === id)!);
  // Evaluate and price each shaft once; only the order totals differ between pickup and shipping.
  const pickup = quoteDesigns(ordered, shop, "pickup");
  const ship = {
    quote: quoteOrder(
      pickup.shafts.map((s) => s.lines),
      "ship",
      shop.priceBook,
    ),
  };
  return {
    designIds,
    customer: { id: customer.id, name: customer.name, email: customer.email },
    shafts: pickup.shafts.map((q, i) =>
      shaftView({
        id: q.design.id,
        position: i + 1,
        name: q.design.name,
        application: q.design.application,
        overall: q.report.overall,
        priceLines: q.lines,
        priceCents: q.priceCents,
        evaluation: q.report,
        repair: q.design.repair ?? null,
      }),
    ),
    pickup: pickup.quote,
    ship: ship.quote,
    depositPercent: shop.priceBook.depositPercent,
    leadTimeWorkingDays: shop.priceBook.leadTimeWorkingDays,
    retubeGeometries: pickup.shafts.map((q) => retubeGeometryOf(q.report)),
    failing: pickup.shafts.filter((s) => s.report.overall === "fail").map((s) => s.design.name),
    others: (
      await em.find(
        Design,
        { customer, id: { $nin: designIds } },
        { orderBy: { updatedAt: "desc" }, limit: 20 },
      )
    ).map((d) => ({ id: d.id, name: d.name })),
  };
}
