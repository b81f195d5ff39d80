"use client";
import "./globals.css";
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
        <main id="main">
          <ErrorScreen error={error} reset={reset} brand />
        </main>
      </body>
    </html>
  );
}
