import nodemailer from "nodemailer";
import { Resend } from "resend";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { startMailFake, type MailFake } from "../../fakes/mail/server";
import type { StoredMessage } from "../../fakes/mail/store";

let fake: MailFake;

async function messages(query = ""): Promise<StoredMessage[]> {
  const res = await fetch(`${fake.httpUrl}/messages${query}`);
  expect(res.status).toBe(200);
  return ((await res.json()) as { data: StoredMessage[] }).data;
}

async function failNext(body: Record<string, unknown>): Promise<void> {
  const res = await fetch(`${fake.httpUrl}/_fake/fail-next`, { method: "POST", body: JSON.stringify(body) });
  expect(res.status).toBe(200);
}

function transport() {
  return nodemailer.createTransport({
    host: "127.0.0.1",
    port: fake.smtpPort,
    secure: false,
    ignoreTLS: true,
  });
}

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0, log: false });
});

afterAll(async () => {
  await fake?.close();
});

beforeEach(async () => {
  await fetch(`${fake.httpUrl}/_fake/reset`, { method: "POST" });
});

describe("SMTP catcher", () => {
  it("keeps what nodemailer sends, parsed", async () => {
    const info = await transport().sendMail({
      from: '"Yokeline Orders" <orders@yokeline.test>',
      to: "Shop Owner <owner@shop.test>",
      bcc: "audit@yokeline.test",
      subject: "Order #1042 confirmed — café ✓",
      text: "Your driveshaft order is confirmed.\nBalance: 1.5 m, 3 ½ in tube.",
      html: "<p>Your <strong>driveshaft</strong> order is confirmed.</p>",
      attachments: [{ filename: "quote.txt", content: "quote body" }],
    });
    expect(info.rejected).toEqual([]);

    const [msg] = await messages("?to=owner@shop.test");
    expect(msg?.via).toBe("smtp");
    expect(msg?.from).toBe("orders@yokeline.test");
    expect(msg?.to).toEqual(["owner@shop.test"]);
    expect(msg?.bcc).toEqual(["audit@yokeline.test"]);
    expect(msg?.subject).toBe("Order #1042 confirmed — café ✓");
    expect(msg?.text?.trim()).toBe("Your driveshaft order is confirmed.\nBalance: 1.5 m, 3 ½ in tube.");
    expect(msg?.html).toBe("<p>Your <strong>driveshaft</strong> order is confirmed.</p>");
    expect(msg?.attachments).toEqual([
      { filename: "quote.txt", contentType: "text/plain", size: 10, contentId: null },
    ]);
    expect(await messages("?to=audit@yokeline.test")).toHaveLength(1);
    expect(await messages("?to=nobody@shop.test")).toEqual([]);
  });

  it("fails the next send on request so the app's retry can be tested", async () => {
    await failNext({ count: 1, via: "smtp" });
    const err = await transport()
      .sendMail({ from: "a@yokeline.test", to: "b@shop.test", subject: "Retry me", text: "x" })
      .catch((e: unknown) => e);
    expect((err as { responseCode?: number }).responseCode).toBe(451);
    expect(await messages()).toEqual([]);

    await transport().sendMail({
      from: "a@yokeline.test",
      to: "b@shop.test",
      subject: "Retry me",
      text: "x",
    });
    expect(await messages("?to=b@shop.test")).toHaveLength(1);
  });
});

describe("Resend fake", () => {
  const resend = () => new Resend("re_test_yokeline", { baseUrl: fake.httpUrl });

  it("accepts POST /emails from the Resend SDK and stores it", async () => {
    const { data, error } = await resend().emails.send({
      from: "Yokeline <no-reply@yokeline.test>",
      to: ["builder@shop.test"],
      subject: "Your sign-in link",
      html: '<a href="http://localhost:3000/magic?token=abc">Sign in</a>',
      text: "Sign in: http://localhost:3000/magic?token=abc",
      tags: [{ name: "kind", value: "magic-link" }],
    });
    expect(error).toBeNull();
    expect(data?.id).toMatch(/^[0-9a-f-]{36}$/);

    const list = await messages("?to=builder@shop.test");
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({
      id: data?.id,
      via: "resend",
      from: "no-reply@yokeline.test",
      subject: "Your sign-in link",
      tags: [{ name: "kind", value: "magic-link" }],
    });
    const fetched = await resend().emails.get(data?.id ?? "");
    expect(fetched.data?.subject).toBe("Your sign-in link");
  });

  it("answers errors in Resend's shape", async () => {
    const missing = await resend().emails.send({
      from: "a@yokeline.test",
      to: "b@shop.test",
      subject: "",
      text: "x",
    });
    expect(missing.data).toBeNull();
    expect(missing.error).toMatchObject({ statusCode: 422, name: "missing_required_field" });

    const badFrom = await resend().emails.send({
      from: "not-an-address",
      to: "b@shop.test",
      subject: "s",
      text: "x",
    });
    expect(badFrom.error).toMatchObject({ statusCode: 422, name: "validation_error" });

    const badKey = new Resend("wrong_key", { baseUrl: fake.httpUrl });
    const denied = await badKey.emails.send({
      from: "a@yokeline.test",
      to: "b@shop.test",
      subject: "s",
      text: "x",
    });
    expect(denied.error).toMatchObject({ statusCode: 403, name: "invalid_api_key" });
    expect(await messages()).toEqual([]);
  });

  it("honours Idempotency-Key like Resend", async () => {
    const payload = { from: "a@yokeline.test", to: "b@shop.test", subject: "Once", text: "x" };
    const first = await resend().emails.send(payload, { idempotencyKey: "welcome/42" });
    const second = await resend().emails.send(payload, { idempotencyKey: "welcome/42" });
    expect(second.data?.id).toBe(first.data?.id);
    const conflict = await resend().emails.send(
      { ...payload, subject: "Other" },
      { idempotencyKey: "welcome/42" },
    );
    expect(conflict.error).toMatchObject({ statusCode: 409, name: "invalid_idempotent_request" });
    expect(await messages()).toHaveLength(1);
  });

  it("fails the next N sends, then recovers", async () => {
    await failNext({ count: 2 });
    const payload = { from: "a@yokeline.test", to: "c@shop.test", subject: "Flaky", text: "x" };
    const one = await resend().emails.send(payload);
    const two = await resend().emails.send(payload);
    expect(one.error).toMatchObject({ statusCode: 500 });
    expect(two.error).toMatchObject({ statusCode: 500 });
    const three = await resend().emails.send(payload);
    expect(three.error).toBeNull();
    expect(await messages("?to=c@shop.test")).toHaveLength(1);
  });
});

describe("mailbox API", () => {
  it("lists newest first across both channels and can be cleared", async () => {
    await transport().sendMail({
      from: "a@yokeline.test",
      to: "same@shop.test",
      subject: "first",
      text: "1",
    });
    await new Resend("re_test_x", { baseUrl: fake.httpUrl }).emails.send({
      from: "a@yokeline.test",
      to: "same@shop.test",
      subject: "second",
      text: "2",
    });
    const list = await messages("?to=SAME@shop.test");
    expect(list.map((m) => [m.subject, m.via])).toEqual([
      ["second", "resend"],
      ["first", "smtp"],
    ]);

    const waited = fetch(`${fake.httpUrl}/messages?to=late@shop.test&wait=3000`);
    setTimeout(
      () =>
        void transport().sendMail({
          from: "a@yokeline.test",
          to: "late@shop.test",
          subject: "late",
          text: "x",
        }),
      100,
    );
    const body = (await (await waited).json()) as { data: StoredMessage[] };
    expect(body.data.map((m) => m.subject)).toEqual(["late"]);

    const del = await fetch(`${fake.httpUrl}/messages`, { method: "DELETE" });
    expect(del.status).toBe(200);
    expect(await messages()).toEqual([]);
  });
});
