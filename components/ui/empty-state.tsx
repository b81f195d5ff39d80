import type { LucideIcon } from "lucide-react";

/** What a list shows when there is nothing in it yet, and what to do about it. */
export function EmptyState({
  icon: Icon,
  title,
  children,
  action,
}: {
  icon: LucideIcon;
  title: string;
  children?: React.ReactNode;
  action?: React.ReactNode;
}) {
  return (
    <div className="flex flex-col items-center card px-6 py-12 text-center">
      <Icon className="size-10 text-steel-500" aria-hidden="true" />
      <h2 className="mt-3 text-lg font-semibold">{title}</h2>
      {children && <div className="mt-1 max-w-md text-sm text-ink-muted">{children}</div>}
      {action && <div className="mt-5">{action}</div>}
    </div>
  );
}
