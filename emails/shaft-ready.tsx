import { Heading, Link } from "@react-email/components";
import { EmailLayout, heading, type EmailShop } from "./components/email-layout";
import { ActionButton, Facts, LineItems, Paragraph, type EmailLine } from "./components/parts";

export interface ShaftReadyProps {
  shop: EmailShop;
  orderNumber: string;
  customerName: string;
  fulfilment: "pickup" | "ship";
  /** The shafts, amounts may be "" when only descriptions matter. */
  lines: EmailLine[];
  /** Left to pay before pickup/shipping; null when fully paid. */
  balanceDue: string | null;
  payUrl: string | null;
  orderUrl: string;
}

export const shaftReadySubject = (p: Pick<ShaftReadyProps, "orderNumber">) =>
  `Order ${p.orderNumber} is ready`;

export function ShaftReadyEmail(p: ShaftReadyProps) {
  const pickup = p.fulfilment === "pickup";
  return (
    <EmailLayout
      shop={p.shop}
      preview={`Your shafts for order ${p.orderNumber} are built, balanced and ready.`}
    >
      <Heading as="h1" style={heading}>
        Your order is ready
      </Heading>
      <Paragraph>
        Good news, {p.customerName}: the shafts for order <strong>{p.orderNumber}</strong> are built, balanced
        and checked.{" "}
        {pickup
          ? "You can pick them up at the counter during opening hours."
          : "We are packing them and will send tracking details when they ship."}
      </Paragraph>
      <LineItems lines={p.lines} />
      {p.balanceDue && (
        <>
          <Facts facts={[["Left to pay", p.balanceDue]]} />
          {p.payUrl && <ActionButton href={p.payUrl}>{`Pay ${p.balanceDue}`}</ActionButton>}
        </>
      )}
      <Paragraph>
        Your order: <Link href={p.orderUrl}>{p.orderUrl}</Link>
      </Paragraph>
    </EmailLayout>
  );
}

export default ShaftReadyEmail;
