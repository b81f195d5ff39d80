import { json, parseJson, route } from "@/lib/http/route";
import { logger } from "@/lib/logger";
import { placeOrder } from "@/lib/orders/place-order";
import { placeOrderBodySchema } from "@/lib/orders/schemas";
import { startCheckout } from "@/lib/orders/payments";

// POST /api/orders — place an order from saved designs and open the checkout for what is due now
export const POST = route({ permission: null }, async ({ req, user }) => {
  const body = await parseJson(req, placeOrderBodySchema);
  const order = await placeOrder(user!, body);
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
