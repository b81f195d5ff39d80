import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, mutedText, type EmailShop } from "./components/email-layout";
import { ActionButton, Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface BalanceDueProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  balanceDue: string;
  total: string;
  paidSoFar: string;
  /** The hosted payment page for the balance. */
  payUrl: string;
  /** Formatted; the date the shafts are promised for. */
  promisedDate: string;
  lines: EmailLine[];
  orderUrl: string;
}

export const balanceDueSubject = (p: Pick<BalanceDueProps, "orderNumber" | "balanceDue">) =>
  `Balance of ${p.balanceDue} due for order ${p.orderNumber}`;

export function BalanceDueEmail(p: BalanceDueProps) {
  return (
    <EmailLayout shop={p.shop} preview={`${p.balanceDue} is left to pay on order ${p.orderNumber}.`}>
      <Heading as="h1" style={heading}>
        Balance due on {p.orderNumber}
      </Heading>
      <Paragraph>
        Hello {p.customerName}, the balance of <strong>{p.balanceDue}</strong> is due on order{" "}
        <strong>{p.orderNumber}</strong>. You can pay it online in a minute:
      </Paragraph>
      <ActionButton href={p.payUrl}>{`Pay ${p.balanceDue}`}</ActionButton>
      <Facts
        facts={[
          ["Order total", p.total],
          ["Paid so far", p.paidSoFar],
          ["Balance due", p.balanceDue],
          ["Promised for", p.promisedDate],
        ]}
      />
      <LineItems lines={p.lines} />
      <Paragraph>
        <span style={mutedText}>
          If the button does not work, open <Link href={p.payUrl}>{p.payUrl}</Link>. Your order:{" "}
          <Link href={p.orderUrl}>{p.orderUrl}</Link>
        </span>
      </Paragraph>
    </EmailLayout>
  );
}

export default BalanceDueEmail;
