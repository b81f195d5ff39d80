/**
 * Starts the Stripe fake and the mail fakes in one process for `npm start`
 * and the test scripts. Ports and behaviour come from the environment (see README).
 */
import { mailFakeOptionsFromEnv, startMailFake, type MailFake } from "./mail/server";
import { startStripeFake, stripeFakeOptionsFromEnv, type StripeFake } from "./stripe/server";

async function main(): Promise<void> {
  let stripe: StripeFake | null = null;
  let mail: MailFake | null = null;
  let stopping = false;

  const stop = async (code: number) => {
    if (stopping) return;
    stopping = true;
    const results = await Promise.allSettled([stripe?.close(), mail?.close()]);
    for (const r of results)
      if (r.status === "rejected") console.error("[fakes] error while stopping:", r.reason);
    process.exit(code);
  };
  process.once("SIGINT", () => void stop(0));
  process.once("SIGTERM", () => void stop(0));

  try {
    stripe = await startStripeFake(stripeFakeOptionsFromEnv());
    mail = await startMailFake(mailFakeOptionsFromEnv());
  } catch (err) {
    console.error("[fakes] failed to start:", err instanceof Error ? err.message : err);
    await stop(1);
    return;
  }
  console.log(`[fakes] stripe: ${stripe.url} (webhooks → ${stripe.config.webhookUrl ?? "none configured"})`);
  console.log(`[fakes] mail: smtp://127.0.0.1:${mail.smtpPort}, resend + inbox ${mail.httpUrl}`);
}

void main();
