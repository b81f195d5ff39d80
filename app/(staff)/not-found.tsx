import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";

// notFound() on a staff screen: an order, serial or message that does not exist (or no longer does).
export default function StaffNotFound() {
  return (
    <StatusPanel
      code="404"
      title="Nothing here"
      actions={
        <Link href="/" className="btn-primary no-underline">
          Go to your home page
        </Link>
      }
    >
      No order, shaft or page answers to that address. Check the number or the link you followed.
    </StatusPanel>
  );
}
