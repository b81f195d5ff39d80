"use client";
import { ErrorScreen } from "./error-screen";

/** The error page of each route group ((auth), (shop), (staff)): the group's layout still frames it. */
export function GroupErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorScreen error={error} reset={reset} />;
}
