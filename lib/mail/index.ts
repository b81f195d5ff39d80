import "server-only";
/** The mail port: templates, the outbox and its delivery. The rest of the app imports from here. */
export {
  queueEmail,
  enqueueDelivery,
  flushQueuedEmails,
  deliverEmail,
  type QueueEmailInput,
  type DeliveryOutcome,
} from "./outbox";
export {
  renderEmail,
  TEMPLATE_NAMES,
  isTemplateName,
  type TemplateName,
  type TemplateProps,
  type RenderedEmail,
} from "./templates";
export { getMailTransport, mailFrom } from "./config";
export { MailSendError, type MailTransport, type OutgoingMail, type SentMail } from "./transport";
export type { EmailLine, EmailTotal } from "@/emails/components/parts";
