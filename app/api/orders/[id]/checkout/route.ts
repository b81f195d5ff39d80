import { json, route } from "@/lib/http/route";
import { getEm } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { loadOrderForUser } from "@/lib/orders/access";
import { mayOpenCheckout, startCheckout } from "@/lib/orders/payments";

// POST /api/orders/:id/checkout — open (or reuse) the checkout for the order's next payment
export const POST = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  // The floor sees every order but takes no money.
  if (!mayOpenCheckout(user!))
    throw new AppError("forbidden", "Only the customer, the counter or an owner can take a payment.");
  const order = await loadOrderForUser(await getEm(), user!, params.id);
  const payment = await startCheckout(order.id, user);
  return json({ checkoutUrl: payment.checkoutUrl, amountCents: payment.amountCents, kind: payment.kind });
});
