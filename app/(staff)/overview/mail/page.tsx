import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Mail } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { isDemo } from "@/lib/shop/shop";
import { listOutbox } from "@/lib/mail/outbox-view";
import { CELL, TableCard } from "@/components/ui/table-card";
import { PageHeader } from "@/components/ui/page-header";
import { ShopTime } from "@/components/shop-locale";
import { EmptyState } from "@/components/ui/empty-state";
import { MailStatus } from "./_components/mail-status";

export const metadata: Metadata = { title: "Sent mail" };

// Demo mode only: every e-mail the app has queued, sent or given up on, newest first.
export default async function SentMailPage() {
  await requirePermission("mail.outbox", "/overview/mail");
  if (!isDemo()) notFound();
  const messages = await listOutbox();
  return (
    <>
      <PageHeader
        title="Sent mail"
        description="Every e-mail the app has written, newest first. Shown in demo mode only."
      />
      {messages.length === 0 ? (
        <EmptyState icon={Mail} title="No e-mail yet">
          Placing an order or taking a payment sends the customer an e-mail; it will appear here.
        </EmptyState>
      ) : (
        <TableCard
          caption="E-mails written by the app, newest first"
          headings={["Created", "To", "Subject", "Template", "Status", "Last error"]}
        >
          {messages.map((m) => (
            <tr key={m.id} className="align-top">
              <td className={`${CELL} whitespace-nowrap`}>
                <ShopTime at={m.createdAt} />
              </td>
              <td className={CELL}>{m.to}</td>
              <td className={CELL}>
                <Link href={`/overview/mail/${m.id}`} className="font-medium underline underline-offset-2">
                  {m.subject}
                </Link>
              </td>
              <td className={`${CELL} font-mono text-xs`}>{m.template}</td>
              <td className={`${CELL} whitespace-nowrap`}>
                <MailStatus status={m.status} attempts={m.attempts} />
              </td>
              <td className="max-w-xs px-4 py-2 text-xs text-ink-muted">{m.lastError ?? "—"}</td>
            </tr>
          ))}
        </TableCard>
      )}
    </>
  );
}
