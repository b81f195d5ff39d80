import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";

export default function Forbidden() {
  return (
    <main id="main">
      <StatusPanel
        brand
        code="403"
        title="This page is for shop staff"
        actions={
          <Link href="/" className="btn-primary no-underline">
            Go to your home page
          </Link>
        }
      >
        Your account does not have access to it. If you think it should, ask the shop’s owner.
      </StatusPanel>
    </main>
  );
}
