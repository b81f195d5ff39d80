import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";
import { getCurrentUser } from "@/lib/auth/guard";
import { ROLE_LABEL } from "@/lib/navigation";

/** 403: a customer is told the page is the shop's; staff are told their role does not include it. */
export default async function Forbidden() {
  const user = await getCurrentUser().catch(() => null);
  const staff = user !== null && user.role !== "customer";
  return (
    <main id="main">
      <StatusPanel
        brand
        code="403"
        title={staff ? "This page is not part of your role" : "This page is for shop staff"}
        actions={
          <Link href="/" className="btn-primary no-underline">
            Go to your home page
          </Link>
        }
      >
        {staff
          ? `Your account (${ROLE_LABEL[user.role]}) does not have access to it. If you need it, ask the shop’s owner to change your role.`
          : "Your account does not have access to it. If you think it should, ask the shop’s owner."}
      </StatusPanel>
    </main>
  );
}
