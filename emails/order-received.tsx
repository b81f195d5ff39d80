import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, mutedText, type EmailShop } from "./components/email-layout";
import { Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface OrderReceivedProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  lines: EmailLine[];
  subtotal: string;
  tax: string;
  shipping: string;
  total: string;
  /** What has been paid so far, e.g. the deposit. */
  paid: string;
  /** Formatted, e.g. "Friday 12 December 2026". */
  promisedDate: string;
  fulfilment: "pickup" | "ship";
  orderUrl: string;
}

export const orderReceivedSubject = (p: Pick<OrderReceivedProps, "orderNumber">) =>
  `We have your order ${p.orderNumber}`;

export function OrderReceivedEmail(p: OrderReceivedProps) {
  return (
    <EmailLayout shop={p.shop} preview={`Order ${p.orderNumber} is in — promised for ${p.promisedDate}.`}>
      <Heading as="h1" style={heading}>
        Thank you, {p.customerName}
      </Heading>
      <Paragraph>
        We have received order <strong>{p.orderNumber}</strong> and it is in the queue for the shop floor. We
        will e-mail you when your shafts are {p.fulfilment === "ship" ? "ready to ship" : "ready to pick up"}.
      </Paragraph>
      <Facts
        facts={[
          ["Order", p.orderNumber],
          ["Promised for", p.promisedDate],
          ["Paid so far", p.paid],
        ]}
      />
      <LineItems
        lines={p.lines}
        totals={[
          { label: "Subtotal", amount: p.subtotal },
          { label: "Tax", amount: p.tax },
          { label: "Shipping", amount: p.shipping },
          { label: "Total", amount: p.total, strong: true },
        ]}
      />
      <Paragraph>
        Follow its progress at <Link href={p.orderUrl}>{p.orderUrl}</Link>.
      </Paragraph>
      <Paragraph>
        <span style={mutedText}>Reply to this e-mail or call us if anything in the order looks wrong.</span>
      </Paragraph>
    </EmailLayout>
  );
}

export default OrderReceivedEmail;
