"use client";
import { LogOut } from "lucide-react";
import { sendJson, useMutation } from "@/lib/browser/mutation";

export function SignOutButton() {
  // better-auth's sign-out endpoint, called directly: its browser client (about 12 kB gzip) would
  // otherwise load on every signed-in screen for this one request. A failed call (unreachable or
  // answered with an error) frees the button again.
  const signOut = useMutation(async () => {
    const res = await sendJson<unknown>("/api/auth/sign-out", { body: {} });
    return res.ok
      ? { ok: true as const, data: null }
      : { ok: false as const, error: { code: "sign_out_failed", message: "Could not sign out. Try again." } };
  });
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        className="btn-quiet px-3 py-1.5"
        disabled={signOut.pending}
        onClick={async () => {
          const res = await signOut.run();
          // A full page load, so every server component reads the new session.
          // eslint-disable-next-line @next/next/no-location-assign-relative-destination
          if (res.ok) window.location.assign("/sign-in?signed-out=1");
        }}
      >
        <LogOut className="size-4" aria-hidden="true" />
        {signOut.pending ? "Signing out…" : "Sign out"}
      </button>
      {signOut.error && (
        <span role="alert" className="text-xs text-fail">
          {signOut.error.message}
        </span>
      )}
    </span>
  );
}
