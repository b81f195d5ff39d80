import { Heading } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { Paragraph, PaymentRequest, type EmailLine } from "./components/parts";

export interface PaymentLinkProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  /** "Deposit", "Balance" or "Payment in full". */
  paymentLabel: string;
  amountDue: string;
  total: string;
  paidSoFar: string;
  /** The hosted payment page. */
  payUrl: string;
  /** Formatted; the date the shafts are promised for. */
  promisedDate: string;
  lines: EmailLine[];
  orderUrl: string;
}

export const paymentLinkSubject = (p: Pick<PaymentLinkProps, "orderNumber" | "amountDue">) =>
  `Your payment link for order ${p.orderNumber} (${p.amountDue})`;

/** Sent from the counter: a link to pay what the order asks for now, by card, online. */
export function PaymentLinkEmail(p: PaymentLinkProps) {
  return (
    <EmailLayout shop={p.shop} preview={`Pay ${p.amountDue} on order ${p.orderNumber} online.`}>
      <Heading as="h1" style={heading}>
        Pay for order {p.orderNumber}
      </Heading>
      <Paragraph>
        Hello {p.customerName}, as agreed on the phone, here is the link to pay the{" "}
        {p.paymentLabel.toLowerCase()} of <strong>{p.amountDue}</strong> on order{" "}
        <strong>{p.orderNumber}</strong> by card:
      </Paragraph>
      <PaymentRequest
        payUrl={p.payUrl}
        orderUrl={p.orderUrl}
        due={{ label: p.paymentLabel, amount: p.amountDue }}
        total={p.total}
        paidSoFar={p.paidSoFar}
        promisedDate={p.promisedDate}
        lines={p.lines}
      />
    </EmailLayout>
  );
}

export default PaymentLinkEmail;
