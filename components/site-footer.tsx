/** The caution every page ends with (not printed: the papers carry their own). */
export function SiteFooter() {
  return (
    <footer className="no-print border-t border-line py-4 text-center text-xs text-ink-muted">
      Yokeline · engineering estimates for shop use; they do not replace a qualified engineer or local rules.
    </footer>
  );
}
