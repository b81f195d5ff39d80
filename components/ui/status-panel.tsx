import { BrandMark } from "@/components/brand-mark";

/**
 * The centred message of the app's own error, not-found and refusal screens: a code, a heading,
 * a sentence of what to do, and the ways back.
 */
export function StatusPanel({
  code,
  title,
  children,
  actions,
  brand = false,
}: {
  /** Show the brand above the message (screens outside the app's frame). */
  brand?: boolean;
  code: string;
  title: string;
  children?: React.ReactNode;
  actions: React.ReactNode;
}) {
  return (
    <div className="mx-auto max-w-lg px-4 py-16 text-center">
      {brand && (
        <span className="mb-8 inline-flex items-center gap-3 text-ink">
          <BrandMark className="size-10" />
          <span className="text-2xl font-bold tracking-tight">Yokeline</span>
        </span>
      )}
      <p className="font-mono text-sm text-ink-muted">{code}</p>
      <h1 className="mt-2 text-2xl font-bold">{title}</h1>
      {children && <div className="mt-2 text-ink-muted">{children}</div>}
      <div className="no-print mt-6 flex flex-wrap items-center justify-center gap-3">{actions}</div>
    </div>
  );
}
