import { json, route } from "@/lib/http/route";
import { getEm } from "@/lib/db/orm";
import { loadOrderForUser } from "@/lib/orders/access";
import { startCheckout } from "@/lib/orders/payments";

// POST /api/orders/:id/checkout — open (or reuse) the checkout for the order's next payment
export const POST = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  const order = await loadOrderForUser(await getEm(), user!, params.id);
  const payment = await startCheckout(order.id, user);
  return json({ checkoutUrl: payment.checkoutUrl, amountCents: payment.amountCents, kind: payment.kind });
});
