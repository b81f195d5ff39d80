import Link from "next/link";

export default function NotFound() {
  return (
    <main id="main" className="mx-auto max-w-lg px-4 py-16 text-center">
      <p className="font-mono text-sm text-ink-muted">404</p>
      <h1 className="mt-2 text-2xl font-bold">Nothing here</h1>
      <p className="mt-2 text-ink-muted">That page does not exist, or it is not yours to see.</p>
      <Link href="/" className="mt-6 btn-primary no-underline">
        Go to your home page
      </Link>
    </main>
  );
}
