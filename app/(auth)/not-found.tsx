import Link from "next/link";
import { StatusPanel } from "@/components/ui/status-panel";

export default function AuthNotFound() {
  return (
    <StatusPanel
      code="404"
      title="Nothing here"
      actions={
        <Link href="/sign-in" className="btn-primary no-underline">
          Go to sign-in
        </Link>
      }
    >
      That link does not lead anywhere. If it came in an e-mail, it may have been used already or expired.
    </StatusPanel>
  );
}
