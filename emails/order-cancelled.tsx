import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, mutedText, type EmailShop } from "./components/email-layout";
import { Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface OrderCancelledProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  reason: string;
  /** Formatted; what was paid on the order. */
  paid: string;
  /** Formatted; what is given back (may be "$0.00"). */
  refund: string;
  /** Formatted; what the shop keeps under its cancellation policy, or null when nothing. */
  kept: string | null;
  /** How the refund reaches the customer, in words (e.g. "to the card you paid with"). */
  refundHow: string | null;
  lines: EmailLine[];
  orderUrl: string;
}

export const orderCancelledSubject = (p: Pick<OrderCancelledProps, "orderNumber">) =>
  `Order ${p.orderNumber} is cancelled`;

/** The order was cancelled by the shop: why, and what is refunded. */
export function OrderCancelledEmail(p: OrderCancelledProps) {
  return (
    <EmailLayout shop={p.shop} preview={`Order ${p.orderNumber} is cancelled; refund ${p.refund}.`}>
      <Heading as="h1" style={heading}>
        Order {p.orderNumber} is cancelled
      </Heading>
      <Paragraph>
        Hello {p.customerName}, your order <strong>{p.orderNumber}</strong> has been cancelled: {p.reason}
      </Paragraph>
      <Facts
        facts={[
          ["Paid", p.paid],
          ...(p.kept ? ([["Cancellation fee kept", p.kept]] as Array<[string, string]>) : []),
          ["Refund", p.refund],
        ]}
      />
      {p.refundHow && <Paragraph>The refund is returned {p.refundHow}.</Paragraph>}
      <LineItems lines={p.lines} />
      <Paragraph>
        <span style={mutedText}>
          Questions? Reply to this e-mail or call us. Your order: <Link href={p.orderUrl}>{p.orderUrl}</Link>
        </span>
      </Paragraph>
    </EmailLayout>
  );
}

export default OrderCancelledEmail;
