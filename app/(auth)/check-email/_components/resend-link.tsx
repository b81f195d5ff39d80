"use client";
import { useState } from "react";
import { authClient } from "@/lib/auth/client";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";

/** Sends the verification link again (the server says the same whether or not the address has an account). */
export function ResendLink({ email }: { email: string }) {
  const [sent, setSent] = useState(false);
  // better-auth's client answers an error as a value; a dropped connection rejects (useMutation
  // ends the busy state either way).
  const resend = useMutation(async () => {
    const { error } = await authClient.sendVerificationEmail({ email, callbackURL: "/orders?welcome=1" });
    return error
      ? {
          ok: false as const,
          error: { code: "resend_failed", message: "Could not send a new link just now." },
        }
      : { ok: true as const, data: null };
  });
  return (
    <div className="space-y-3">
      {sent && !resend.error && <Alert tone="success">A new link is on its way to {email}.</Alert>}
      {resend.error && <Alert tone="error">{resend.error.message} Wait a minute, then try again.</Alert>}
      <button
        type="button"
        className="btn-quiet"
        disabled={resend.pending}
        onClick={async () => {
          const res = await resend.run();
          setSent(res.ok);
        }}
      >
        {resend.pending ? "Sending…" : "Send the link again"}
      </button>
    </div>
  );
}
