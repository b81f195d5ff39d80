"use client";
import { useEffect, useTransition } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { RotateCcw } from "lucide-react";
import { StatusPanel } from "@/components/ui/status-panel";

/**
 * The body of every error.tsx: says plainly that the screen failed (nothing the user saved is
 * lost), offers to try again (re-fetching the server's part too) and a way home. The digest is the
 * reference in the server's log.
 */
export function ErrorScreen({
  error,
  reset,
  homeHref = "/",
  brand = false,
}: {
  /** Outside the app's frame (the root error boundaries): show the brand. */
  brand?: boolean;
  error: Error & { digest?: string };
  reset: () => void;
  homeHref?: string;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <StatusPanel
      brand={brand}
      code="Error"
      title="This screen could not be shown"
      actions={
        <>
          <button
            type="button"
            className="btn-primary"
            disabled={pending}
            onClick={() =>
              startTransition(() => {
                router.refresh();
                reset();
              })
            }
          >
            <RotateCcw className="size-4" aria-hidden="true" />
            {pending ? "Trying again…" : "Try again"}
          </button>
          <Link href={homeHref} className="btn-quiet no-underline">
            Go to your home page
          </Link>
        </>
      }
    >
      <p>
        Something went wrong on our side. Nothing you had already saved is lost. If it keeps happening, the
        shop’s system may be restarting: wait a minute and try again.
      </p>
      {error.digest && (
        <p className="mt-3 text-sm">
          Reference for the shop: <span className="font-mono">{error.digest}</span>
        </p>
      )}
    </StatusPanel>
  );
}
