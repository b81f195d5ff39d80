"use client";
import { useState } from "react";
import { authClient } from "@/lib/auth/client";
import { Alert } from "@/components/ui/alert";

/** Sends the verification link again (the server says the same whether or not the address has an account). */
export function ResendLink({ email }: { email: string }) {
  const [state, setState] = useState<"idle" | "sending" | "sent" | "failed">("idle");
  return (
    <div className="space-y-3">
      {state === "sent" && <Alert tone="success">A new link is on its way to {email}.</Alert>}
      {state === "failed" && (
        <Alert tone="error">Could not send a new link just now. Wait a minute, then try again.</Alert>
      )}
      <button
        type="button"
        className="btn-quiet"
        disabled={state === "sending"}
        onClick={async () => {
          setState("sending");
          const { error } = await authClient.sendVerificationEmail({
            email,
            callbackURL: "/orders?welcome=1",
          });
          setState(error ? "failed" : "sent");
        }}
      >
        {state === "sending" ? "Sending…" : "Send the link again"}
      </button>
    </div>
  );
}
