import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";

export default function NotFound() {
  return (
    <main id="main">
      <StatusPanel
        brand
        code="404"
        title="Nothing here"
        actions={
          <Link href="/" className="btn-primary no-underline">
            Go to your home page
          </Link>
        }
      >
        That page does not exist, or it is not yours to see.
      </StatusPanel>
    </main>
  );
}
