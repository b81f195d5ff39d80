import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface PaymentReceiptProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  /** What this payment was, e.g. "Deposit", "Balance", "Payment in full". */
  paymentLabel: string;
  amountPaid: string;
  /** Formatted date of the payment. */
  paidOn: string;
  totalPaid: string;
  /** What is still owed after this payment, e.g. "$0.00". */
  balanceRemaining: string;
  lines: EmailLine[];
  total: string;
  orderUrl: string;
}

export const paymentReceiptSubject = (p: Pick<PaymentReceiptProps, "orderNumber" | "amountPaid">) =>
  `Receipt: ${p.amountPaid} for order ${p.orderNumber}`;

export function PaymentReceiptEmail(p: PaymentReceiptProps) {
  return (
    <EmailLayout shop={p.shop} preview={`We received ${p.amountPaid} for order ${p.orderNumber}.`}>
      <Heading as="h1" style={heading}>
        Payment received
      </Heading>
      <Paragraph>
        Thank you, {p.customerName}. This is your receipt for order <strong>{p.orderNumber}</strong>.
      </Paragraph>
      <Facts
        facts={[
          [p.paymentLabel, p.amountPaid],
          ["Paid on", p.paidOn],
          ["Paid in total", p.totalPaid],
          ["Still to pay", p.balanceRemaining],
        ]}
      />
      <LineItems lines={p.lines} totals={[{ label: "Order total", amount: p.total, strong: true }]} />
      <Paragraph>
        Your order: <Link href={p.orderUrl}>{p.orderUrl}</Link>
      </Paragraph>
    </EmailLayout>
  );
}

export default PaymentReceiptEmail;
