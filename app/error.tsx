"use client";
import { ErrorScreen } from "@/components/error-screen";

// Errors outside the route groups (the home page); the root layout still frames it.
export default function ErrorPage({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return (
    <main id="main">
      <ErrorScreen error={error} reset={reset} brand />
    </main>
  );
}
