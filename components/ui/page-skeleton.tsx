/**
 * What a screen shows while its data loads (loading.tsx): the shape of a header and a table, and
 * "Loading…" for screen readers. Static, so it needs no JavaScript.
 */
export function PageSkeleton({ label = "Loading…", rows = 6 }: { label?: string; rows?: number }) {
  return (
    <div role="status" aria-live="polite" aria-busy="true">
      <span className="sr-only">{label}</span>
      <div aria-hidden="true" className="animate-pulse motion-reduce:animate-none">
        <div className="mb-6">
          <div className="h-8 w-64 max-w-full rounded bg-paper-sunk" />
          <div className="mt-3 h-4 w-96 max-w-full rounded bg-paper-sunk" />
        </div>
        <div className="card p-4">
          <div className="h-9 w-full rounded bg-paper-sunk" />
          {Array.from({ length: rows }, (_, i) => (
            <div
              key={i}
              className="mt-3 h-6 rounded bg-paper-sunk"
              style={{ width: `${92 - (i % 3) * 9}%` }}
            />
          ))}
        </div>
      </div>
    </div>
  );
}
