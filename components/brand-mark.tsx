/** Yokeline's mark: two yoke ears and a cross, drawn as an inline SVG so it prints. */
export function BrandMark({ className = "size-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="#1b2430" />
      <path
        d="M8 7v7a4 4 0 0 0 4 4M24 7v7a4 4 0 0 1-4 4"
        fill="none"
        stroke="#c9972f"
        strokeWidth="3"
        strokeLinecap="round"
      />
      <rect x="11" y="16" width="10" height="4" rx="2" fill="#f7f5f0" />
      <path d="M16 20v6" stroke="#f7f5f0" strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}
