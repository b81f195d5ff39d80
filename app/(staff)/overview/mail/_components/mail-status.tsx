import { CheckCircle2, Clock, XCircle } from "lucide-react";

const LOOK = {
  queued: { word: "Queued", Icon: Clock, className: "text-warn" },
  sent: { word: "Sent", Icon: CheckCircle2, className: "text-pass" },
  failed: { word: "Failed", Icon: XCircle, className: "text-fail" },
} as const;

/** The status of an outbox e-mail as a word (never colour alone) plus the number of attempts. */
export function MailStatus({ status, attempts }: { status: keyof typeof LOOK; attempts: number }) {
  const { word, Icon, className } = LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1.5 font-medium ${className}`}>
      <Icon className="size-4" aria-hidden="true" />
      {word}
      <span className="font-normal text-ink-muted">
        · {attempts} {attempts === 1 ? "attempt" : "attempts"}
      </span>
    </span>
  );
}
