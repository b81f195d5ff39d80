import "server-only";
import { createElement, type ReactElement } from "react";
import { render } from "@react-email/render";
import type { EmailShop } from "@/emails/components/email-layout";
import { OrderReceivedEmail, orderReceivedSubject, type OrderReceivedProps } from "@/emails/order-received";
import {
  PaymentReceiptEmail,
  paymentReceiptSubject,
  type PaymentReceiptProps,
} from "@/emails/payment-receipt";
import { BalanceDueEmail, balanceDueSubject, type BalanceDueProps } from "@/emails/balance-due";
import { PaymentLinkEmail, paymentLinkSubject, type PaymentLinkProps } from "@/emails/payment-link";
import {
  OrderCancelledEmail,
  orderCancelledSubject,
  type OrderCancelledProps,
} from "@/emails/order-cancelled";
import { ShaftReadyEmail, shaftReadySubject, type ShaftReadyProps } from "@/emails/shaft-ready";
import { ShaftShippedEmail, shaftShippedSubject, type ShaftShippedProps } from "@/emails/shaft-shipped";
import { VerifyEmail, verifyEmailSubject, type VerifyEmailProps } from "@/emails/verify-email";
import {
  CustomerInviteEmail,
  customerInviteSubject,
  type CustomerInviteProps,
} from "@/emails/customer-invite";
import { StaffInviteEmail, staffInviteSubject, type StaffInviteProps } from "@/emails/staff-invite";

/** What each template needs from its caller (the shop's details are added by the outbox). */
export interface TemplateProps {
  "order-received": Omit<OrderReceivedProps, "shop">;
  "payment-receipt": Omit<PaymentReceiptProps, "shop">;
  "balance-due": Omit<BalanceDueProps, "shop">;
  "payment-link": Omit<PaymentLinkProps, "shop">;
  "order-cancelled": Omit<OrderCancelledProps, "shop">;
  "shaft-ready": Omit<ShaftReadyProps, "shop">;
  "shaft-shipped": Omit<ShaftShippedProps, "shop">;
  "verify-email": Omit<VerifyEmailProps, "shop">;
  "customer-invite": Omit<CustomerInviteProps, "shop">;
  "staff-invite": Omit<StaffInviteProps, "shop">;
}

export type TemplateName = keyof TemplateProps;

interface TemplateDefinition<P> {
  element: (props: P & { shop: EmailShop }) => ReactElement;
  subject: (props: P) => string;
}

const TEMPLATES: { [N in TemplateName]: TemplateDefinition<TemplateProps[N]> } = {
  "order-received": { element: (p) => createElement(OrderReceivedEmail, p), subject: orderReceivedSubject },
  "payment-receipt": {
    element: (p) => createElement(PaymentReceiptEmail, p),
    subject: paymentReceiptSubject,
  },
  "balance-due": { element: (p) => createElement(BalanceDueEmail, p), subject: balanceDueSubject },
  "payment-link": { element: (p) => createElement(PaymentLinkEmail, p), subject: paymentLinkSubject },
  "order-cancelled": {
    element: (p) => createElement(OrderCancelledEmail, p),
    subject: orderCancelledSubject,
  },
  "shaft-ready": { element: (p) => createElement(ShaftReadyEmail, p), subject: shaftReadySubject },
  "shaft-shipped": { element: (p) => createElement(ShaftShippedEmail, p), subject: shaftShippedSubject },
  "verify-email": { element: (p) => createElement(VerifyEmail, p), subject: verifyEmailSubject },
  "customer-invite": {
    element: (p) => createElement(CustomerInviteEmail, p),
    subject: customerInviteSubject,
  },
  "staff-invite": { element: (p) => createElement(StaffInviteEmail, p), subject: staffInviteSubject },
};

export const TEMPLATE_NAMES = Object.keys(TEMPLATES) as TemplateName[];

export function isTemplateName(value: string): value is TemplateName {
  return Object.hasOwn(TEMPLATES, value);
}

export interface RenderedEmail {
  subject: string;
  html: string;
  text: string;
}

/** Renders one template to its subject, HTML and plain-text versions. */
export async function renderEmail<N extends TemplateName>(
  template: N,
  props: TemplateProps[N],
  shop: EmailShop,
): Promise<RenderedEmail> {
  const definition = TEMPLATES[template] as TemplateDefinition<TemplateProps[N]>;
  const element = definition.element({ ...props, shop });
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  return { subject: definition.subject(props), html, text };
}
