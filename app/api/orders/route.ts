import { json, parseJson, route } from "@/lib/http/route";
import { logger } from "@/lib/logger";
import { placeOrder } from "@/lib/orders/place-order";
import { placeOrderBodySchema } from "@/lib/orders/schemas";
import { startCheckout } from "@/lib/orders/payments";
import { needsEngineeringSignoff, type CheckLike } from "@/lib/orders/acknowledgements";

// POST /api/orders — place an order from saved designs and open the checkout for what is due now
export const POST = route({ permission: null }, async ({ req, user }) => {
  const body = await parseJson(req, placeOrderBodySchema);
  const order = await placeOrder(user!, body);
  // A shaft that fails a check (placed by the counter) waits for the owner's sign-off: no checkout yet.
  const signoff = order.shafts
    .getItems()
    .some((s) => needsEngineeringSignoff((s.evaluation.checks ?? []) as CheckLike[]));
  if (signoff)
    return json({ id: order.id, number: order.number, checkoutUrl: null, needsSignoff: true }, 201);
  // The order stands even if the payment provider is unreachable; the order page offers to pay again.
  const checkoutUrl = await startCheckout(order.id, user).then(
    (payment) => payment.checkoutUrl,
    (error: unknown) => {
      logger.warn({ err: error, order: order.number }, "could not open a checkout for a new order");
      return null;
    },
  );
  return json({ id: order.id, number: order.number, checkoutUrl }, 201);
});
