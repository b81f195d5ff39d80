import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { ActionButton, Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface ShaftShippedProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  carrier: string;
  trackingNumber: string;
  trackingUrl: string | null;
  /** The delivery address, lines separated by newlines. */
  shipTo: string;
  /** Formatted date it left the shop. */
  shippedOn: string;
  lines: EmailLine[];
  orderUrl: string;
}

export const shaftShippedSubject = (p: Pick<ShaftShippedProps, "orderNumber">) =>
  `Order ${p.orderNumber} has shipped`;

export function ShaftShippedEmail(p: ShaftShippedProps) {
  return (
    <EmailLayout shop={p.shop} preview={`Order ${p.orderNumber} is on its way with ${p.carrier}.`}>
      <Heading as="h1" style={heading}>
        Your order is on its way
      </Heading>
      <Paragraph>
        {p.customerName}, order <strong>{p.orderNumber}</strong> left the shop on {p.shippedOn}.
      </Paragraph>
      <Facts
        facts={[
          ["Carrier", p.carrier],
          ["Tracking number", p.trackingNumber],
          ["Shipping to", p.shipTo.split("\n").join(", ")],
        ]}
      />
      {p.trackingUrl && <ActionButton href={p.trackingUrl}>Track the parcel</ActionButton>}
      <LineItems lines={p.lines} />
      <Paragraph>
        Your order: <Link href={p.orderUrl}>{p.orderUrl}</Link>
      </Paragraph>
    </EmailLayout>
  );
}

export default ShaftShippedEmail;
