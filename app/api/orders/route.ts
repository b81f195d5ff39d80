import { json, parseJson, route } from "@/lib/http/route";
import { placeOrder } from "@/lib/orders/place-order";
import { placeOrderBodySchema } from "@/lib/orders/schemas";
import { startCheckout } from "@/lib/orders/payments";

// POST /api/orders — place an order from saved designs and open the checkout for what is due now
export const POST = route({ permission: null }, async ({ req, user }) => {
  const body = await parseJson(req, placeOrderBodySchema);
  const order = await placeOrder(user!, body);
  const payment = await startCheckout(order.id, user);
  return json({ id: order.id, number: order.number, checkoutUrl: payment.checkoutUrl }, 201);
});
