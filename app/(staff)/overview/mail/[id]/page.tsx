import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { isDemo } from "@/lib/shop/shop";
import { getOutboxMessage } from "@/lib/mail/outbox-view";
import { PageHeader } from "@/components/ui/page-header";
import { ShopTime } from "@/components/shop-locale";
import { Alert } from "@/components/ui/alert";
import { MailStatus } from "../_components/mail-status";

export const metadata: Metadata = { title: "E-mail" };

// One e-mail as the customer sees it, in a sandboxed frame (no scripts, no same-origin access).
export default async function SentMailMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requirePermission("mail.outbox", `/overview/mail/${id}`);
  if (!isDemo()) notFound();
  const message = await getOutboxMessage(id);
  if (!message) notFound();
  return (
    <>
      <PageHeader
        title={message.subject}
        description={
          <>
            To {message.to} · <span className="font-mono text-xs">{message.template}</span> ·{" "}
            <ShopTime at={message.createdAt} />
          </>
        }
        actions={
          <Link href="/overview/mail" className="btn-quiet">
            All sent mail
          </Link>
        }
      />
      <div className="mb-4 flex flex-wrap items-center gap-4 text-sm">
        <MailStatus status={message.status} attempts={message.attempts} />
        {message.provider && <span className="text-ink-muted">via {message.provider}</span>}
      </div>
      {message.lastError && (
        <div className="mb-4">
          <Alert tone={message.status === "failed" ? "error" : "warning"} title="Last delivery error">
            {message.lastError}
          </Alert>
        </div>
      )}
      <div className="overflow-hidden card">
        <iframe
          title={`E-mail: ${message.subject}`}
          srcDoc={message.html}
          sandbox=""
          className="h-[70vh] w-full bg-white"
        />
      </div>
      <details className="mt-4 card p-4">
        <summary className="cursor-pointer font-medium">Plain-text version</summary>
        <pre className="mt-3 font-mono text-xs whitespace-pre-wrap">{message.text}</pre>
      </details>
    </>
  );
}
