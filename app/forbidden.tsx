import Link from "next/link";

export default function Forbidden() {
  return (
    <main id="main" className="mx-auto max-w-lg px-4 py-16 text-center">
      <p className="font-mono text-sm text-ink-muted">403</p>
      <h1 className="mt-2 text-2xl font-bold">This page is for shop staff</h1>
      <p className="mt-2 text-ink-muted">
        Your account does not have access to it. If you think it should, ask the shop’s owner.
      </p>
      <Link href="/" className="mt-6 btn-primary no-underline">
        Go to your home page
      </Link>
    </main>
  );
}
