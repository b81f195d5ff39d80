import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";

// notFound() on a customer's screen: an order, shaft or design that is absent or someone else's.
export default function ShopNotFound() {
  return (
    <StatusPanel
      code="404"
      title="Nothing here"
      actions={
        <>
          <Link href="/orders" className="btn-primary no-underline">
            Go to my orders
          </Link>
          <Link href="/build" className="btn-quiet no-underline">
            Design a shaft
          </Link>
        </>
      }
    >
      That order, shaft or page does not exist, or it is not yours to see. Check the link, or find it in your
      orders.
    </StatusPanel>
  );
}
