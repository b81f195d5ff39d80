import { Heading } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { Paragraph, PaymentRequest, type EmailLine } from "./components/parts";

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
      <PaymentRequest
        payUrl={p.payUrl}
        orderUrl={p.orderUrl}
        due={{ label: "Balance due", amount: p.balanceDue }}
        total={p.total}
        paidSoFar={p.paidSoFar}
        promisedDate={p.promisedDate}
        lines={p.lines}
      />
    </EmailLayout>
  );
}

export default BalanceDueEmail;
