"use client";
import { LogOut } from "lucide-react";
import { authClient } from "@/lib/auth/client";
import { useMutation } from "@/lib/browser/mutation";

export function SignOutButton() {
  // better-auth's client; a failed call (rejected or answered with an error) frees the button again.
  const signOut = useMutation(async () => {
    const { error } = await authClient.signOut();
    return error
      ? { ok: false as const, error: { code: "sign_out_failed", message: "Could not sign out. Try again." } }
      : { ok: true as const, data: null };
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
