import { AlertTriangle, CheckCircle2, Info, XCircle } from "lucide-react";

const STYLES = {
  info: { box: "border-steel-100 bg-steel-50 text-steel-900", Icon: Info },
  success: { box: "border-pass/30 bg-pass-soft text-pass", Icon: CheckCircle2 },
  warning: { box: "border-warn/30 bg-warn-soft text-warn", Icon: AlertTriangle },
  error: { box: "border-fail/30 bg-fail-soft text-fail", Icon: XCircle },
} as const;

/** A boxed message; errors are announced to screen readers. */
export function Alert({
  tone = "info",
  title,
  children,
}: {
  tone?: keyof typeof STYLES;
  title?: string;
  children?: React.ReactNode;
}) {
  const { box, Icon } = STYLES[tone];
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={`flex gap-3 rounded-md border p-3 text-sm ${box}`}
    >
      <Icon className="mt-0.5 size-4 shrink-0" aria-hidden="true" />
      <div>
        {title && <p className="font-semibold">{title}</p>}
        {children && <div className={title ? "mt-0.5" : undefined}>{children}</div>}
      </div>
    </div>
  );
}
