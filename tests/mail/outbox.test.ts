import { afterAll, beforeAll, beforeEach, describe, expect } from "vitest";
import { EmailMessage, Order } from "@/entities";
import { getEm, inTransaction } from "@/lib/db/orm";
import { deliverEmail, enqueueDelivery, flushQueuedEmails, queueEmail } from "@/lib/mail";
import { stopBoss } from "@/lib/jobs/boss";
import { startMailWorkers } from "@/lib/mail/workers";
import { startMailFake, type MailFake } from "@/fakes/mail/server";
import { dbTest, requireDatabase } from "../setup/db";
import { uniqueEmail } from "../setup/auth-requests";
import { createTestOrder } from "../setup/test-orders";
import { SAMPLE_PROPS } from "./sample-props";

let fake: MailFake;
const saved = { ...process.env };

interface FakeMessage {
  id: string;
  via: "smtp" | "resend";
  to: string[];
  subject: string | null;
  html: string | null;
  text: string | null;
}

async function inbox(to: string, wait = 0): Promise<FakeMessage[]> {
  const res = await fetch(
    `${fake.httpUrl}/messages?to=${encodeURIComponent(to)}${wait ? `&wait=${wait}` : ""}`,
  );
  return ((await res.json()) as { data: FakeMessage[] }).data;
}

async function failNext(count: number, via: "smtp" | "resend" | null = null): Promise<void> {
  await fetch(`${fake.httpUrl}/_fake/fail-next`, { method: "POST", body: JSON.stringify({ count, via }) });
}

/** Queues one e-mail with an order in one committed transaction, as order code does. */
async function queueCommitted(to: string): Promise<{ message: EmailMessage; order: Order }> {
  return inTransaction(async (em) => {
    const order = await createTestOrder(em);
    const message = await queueEmail(em, {
      template: "order-received",
      to,
      props: SAMPLE_PROPS["order-received"],
      orderId: order.id,
    });
    return { message, order };
  });
}

async function row(id: string): Promise<EmailMessage> {
  return (await getEm()).findOneOrFail(EmailMessage, { id });
}

async function waitForStatus(
  id: string,
  status: EmailMessage["status"],
  timeoutMs = 15_000,
): Promise<EmailMessage> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const current = await row(id);
    if (current.status === status || Date.now() > until) return current;
    await new Promise((r) => setTimeout(r, 200));
  }
}

function useSmtp() {
  delete process.env.RESEND_API_KEY;
  delete process.env.RESEND_BASE_URL;
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
}

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0, log: false });
  process.env.MAIL_FROM = "Yokeline test <shop@yokeline.example>";
  // Short retries so the pg-boss tests take seconds: 2 retries, 1 s apart.
  process.env.MAIL_RETRY_LIMIT = "2";
  process.env.MAIL_RETRY_DELAY_SECONDS = "1";
  process.env.MAIL_RETRY_BACKOFF = "0";
  // Other test files leave e-mails queued (nothing delivers them there): this file's workers must
  // not send them, or they would take the failures this file arranges with fail-next.
  requireDatabase();
  const em = await getEm();
  await em.nativeUpdate(
    EmailMessage,
    { status: "queued" },
    { status: "failed", lastError: "left queued by an earlier test file" },
  );
});

beforeEach(async () => {
  useSmtp();
  await fetch(`${fake.httpUrl}/_fake/reset`, { method: "POST" });
});

afterAll(async () => {
  await stopBoss();
  await fake?.close();
  process.env = saved;
});

describe("the e-mail outbox", () => {
  dbTest(
    "queueEmail writes its row only when the caller's transaction commits, and sends nothing",
    async () => {
      const rolledBack = uniqueEmail("rollback");
      await expect(
        inTransaction(async (em) => {
          await queueEmail(em, {
            template: "order-received",
            to: rolledBack,
            props: SAMPLE_PROPS["order-received"],
          });
          throw new Error("the order change failed");
        }),
      ).rejects.toThrow("the order change failed");
      expect(await (await getEm()).count(EmailMessage, { to: rolledBack })).toBe(0);

      const committed = uniqueEmail("commit");
      const { message, order } = await queueCommitted(committed);
      const stored = await row(message.id);
      expect(stored).toMatchObject({
        status: "queued",
        attempts: 0,
        template: "order-received",
        orderId: order.id,
        to: committed,
      });
      expect(stored.subject).toContain("Y26-0042");
      expect(stored.html).toContain("Y26-0042");
      expect(stored.text).toContain("Y26-0042");
      expect(await inbox(committed)).toHaveLength(0);
    },
  );

  dbTest("delivery through SMTP arrives at the local catcher and marks the row sent", async () => {
    const to = uniqueEmail("smtp");
    const { message } = await queueCommitted(to);
    await expect(deliverEmail(message.id, { finalAttempt: false })).resolves.toBe("sent");
    const [received, ...more] = await inbox(to, 5_000);
    expect(more).toHaveLength(0);
    expect(received).toMatchObject({ via: "smtp", subject: "We have your order Y26-0042" });
    expect(received?.text).toContain("Y26-0042");
    const sent = await row(message.id);
    expect(sent).toMatchObject({ status: "sent", provider: "smtp", attempts: 1, lastError: null });
    expect(sent.sentAt).toBeInstanceOf(Date);
    expect(sent.providerMessageId).toBeTruthy();
    // A second run of the job (e.g. a duplicate) does not send again.
    await expect(deliverEmail(message.id, { finalAttempt: false })).resolves.toBe("skipped");
    expect(await inbox(to)).toHaveLength(1);
  });

  dbTest("delivery through the Resend SDK arrives at the Resend fake", async () => {
    process.env.RESEND_API_KEY = "re_test_local_fake";
    process.env.RESEND_BASE_URL = fake.httpUrl;
    const to = uniqueEmail("resend");
    const { message } = await queueCommitted(to);
    await expect(deliverEmail(message.id, { finalAttempt: false })).resolves.toBe("sent");
    const [received] = await inbox(to);
    expect(received).toMatchObject({ via: "resend", subject: "We have your order Y26-0042" });
    expect(received?.html).toContain("Y26-0042");
    expect(await row(message.id)).toMatchObject({
      status: "sent",
      provider: "resend",
      providerMessageId: received?.id,
      attempts: 1,
    });
  });

  dbTest(
    "a refused send records the error and throws, so the job is retried; the last attempt marks it failed",
    async () => {
      process.env.RESEND_API_KEY = "re_test_local_fake";
      process.env.RESEND_BASE_URL = fake.httpUrl;
      const to = uniqueEmail("resend-fail");
      const { message } = await queueCommitted(to);
      await failNext(2, "resend");
      await expect(deliverEmail(message.id, { finalAttempt: false })).rejects.toThrow(
        /Resend refused the message \(500\)/,
      );
      expect(await row(message.id)).toMatchObject({ status: "queued", attempts: 1, provider: "resend" });
      await expect(deliverEmail(message.id, { finalAttempt: true })).rejects.toThrow();
      const failed = await row(message.id);
      expect(failed).toMatchObject({ status: "failed", attempts: 2 });
      expect(failed.lastError).toMatch(/500/);
      expect(await inbox(to)).toHaveLength(0);
    },
  );

  describe("with pg-boss workers", () => {
    beforeAll(async () => {
      // Deliveries left by earlier test files (sign-ups send verification e-mails) would race these
      // tests for the injected failures: drop their pending jobs first.
      await (
        await getEm()
      )
        .getConnection()
        .execute(`delete from pgboss.job where name = 'mail.deliver' and state in ('created', 'retry')`);
      await startMailWorkers({ pollingIntervalSeconds: 0.5 });
    });

    dbTest(
      "a failing send (fail-next) is retried by pg-boss and then succeeds; the order is untouched",
      async () => {
        const to = uniqueEmail("retry");
        const { message, order } = await queueCommitted(to);
        const before = await (await getEm()).findOneOrFail(Order, { id: order.id });
        await failNext(1, "smtp");
        expect(await enqueueDelivery([message.id])).toBe(1);
        expect(await enqueueDelivery([message.id])).toBe(0); // one job per message
        const sent = await waitForStatus(message.id, "sent");
        expect(sent).toMatchObject({ status: "sent", attempts: 2, provider: "smtp", lastError: null });
        expect(await inbox(to)).toHaveLength(1);
        const after = await (await getEm()).findOneOrFail(Order, { id: order.id });
        expect({
          status: after.status,
          paymentState: after.paymentState,
          updatedAt: after.updatedAt,
        }).toEqual({
          status: before.status,
          paymentState: before.paymentState,
          updatedAt: before.updatedAt,
        });
      },
    );

    dbTest(
      "after the last retry the row is failed, still visible, and the order is still there",
      async () => {
        const to = uniqueEmail("exhaust");
        const { message, order } = await queueCommitted(to);
        await failNext(10, "smtp");
        await enqueueDelivery([message.id]);
        const failed = await waitForStatus(message.id, "failed");
        expect(failed).toMatchObject({ status: "failed", attempts: 3 }); // 1 + MAIL_RETRY_LIMIT (2)
        expect(failed.lastError).toMatch(/451|Temporary failure/);
        expect(await inbox(to)).toHaveLength(0);
        expect(await (await getEm()).count(Order, { id: order.id })).toBe(1);
      },
    );

    dbTest("flushQueuedEmails (after commit) and the sweep hand queued rows to the job", async () => {
      const fresh = uniqueEmail("flush");
      const { message } = await queueCommitted(fresh);
      // An old row whose process died between commit and enqueue: only the sweep's age filter sees it.
      const stale = uniqueEmail("stale");
      const old = await inTransaction(async (em) => {
        const m = await queueEmail(em, {
          template: "shaft-ready",
          to: stale,
          props: SAMPLE_PROPS["shaft-ready"],
        });
        m.createdAt = new Date(Date.now() - 60_000);
        return m;
      });
      expect(await flushQueuedEmails({ olderThanSeconds: 30 })).toBeGreaterThanOrEqual(1);
      expect((await waitForStatus(old.id, "sent")).status).toBe("sent");
      expect((await row(message.id)).status).toBe("queued");
      await flushQueuedEmails();
      expect((await waitForStatus(message.id, "sent")).status).toBe("sent");
      expect(await inbox(fresh)).toHaveLength(1);
      expect(await inbox(stale)).toHaveLength(1);
    });
  });
});
