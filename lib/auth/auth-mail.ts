import "server-only";
import { enqueueDelivery, queueEmail, type TemplateName, type TemplateProps } from "@/lib/mail";
import { getEm } from "@/lib/db/orm";

/**
 * Sends an account e-mail (verification link, invitation) through the outbox at once: the row is
 * committed here, then handed to the delivery job (the sweep retries if the queue is down).
 */
export async function sendAccountEmail<N extends TemplateName>(
  template: N,
  to: string,
  props: TemplateProps[N],
): Promise<void> {
  const em = await getEm();
  const message = await queueEmail(em, { template, to, props });
  await em.flush();
  await enqueueDelivery([message.id]);
}
