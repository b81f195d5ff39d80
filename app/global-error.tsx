"use client";
import "./globals.css";
import { BrandMark } from "@/components/brand-mark";
import { ErrorScreen } from "@/components/error-screen";

// When even the root layout fails: it replaces the whole document, so it brings its own html and body.
export default function GlobalError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return (
    <html lang="en">
      <head>
        <title>Error · Yokeline</title>
      </head>
      <body className="bg-paper font-sans">
        <main id="main" className="flex min-h-dvh flex-col items-center px-4 py-10">
          <span className="flex items-center gap-3 text-ink">
            <BrandMark className="size-10" />
            <span className="text-2xl font-bold tracking-tight">Yokeline</span>
          </span>
          <ErrorScreen error={error} reset={reset} />
        </main>
      </body>
    </html>
  );
}
