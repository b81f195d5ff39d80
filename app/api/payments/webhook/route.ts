import { payments } from "@/lib/payments";
import { WebhookSignatureError } from "@/lib/payments/port";
import { applyPaymentEvent } from "@/lib/orders/payments";
import { errorResponse, json } from "@/lib/http/route";
import { readText, WEBHOOK_BODY_LIMIT_BYTES } from "@/lib/http/body";

// POST /api/payments/webhook — provider events; the signature is verified on the raw body
export async function POST(req: Request) {
  let raw: string;
  try {
    raw = await readText(req, WEBHOOK_BODY_LIMIT_BYTES);
  } catch (error) {
    return errorResponse(error);
  }
  try {
    const event = await payments().verifyWebhook(raw, req.headers.get("stripe-signature"));
    const outcome = await applyPaymentEvent(event);
    return json({ received: true, outcome });
  } catch (error) {
    if (error instanceof WebhookSignatureError) {
      return json({ error: { code: "invalid", message: "The webhook signature does not verify." } }, 400);
    }
    return errorResponse(error);
  }
}
