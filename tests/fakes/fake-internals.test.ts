import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import Stripe from "stripe";
import { afterAll, describe, expect, it } from "vitest";
import { parseMime } from "../../fakes/mail/mime";
import { parseStripeForm } from "../../fakes/stripe/form-encoding";
import { startStripeFake } from "../../fakes/stripe/server";

const dir = mkdtempSync(path.join(tmpdir(), "stripe-fake-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("Stripe form decoding", () => {
  it("decodes bracket notation into objects and arrays", () => {
    const body =
      "line_items[0][price_data][unit_amount]=100&line_items[0][price_data][product_data][name]=Yoke%20%26%20tube" +
      "&line_items[1][quantity]=2&metadata[orderId]=o_1&expand[]=payment_intent&expand[]=line_items";
    expect(parseStripeForm(body)).toEqual({
      line_items: [
        { price_data: { unit_amount: "100", product_data: { name: "Yoke & tube" } } },
        { quantity: "2" },
      ],
      metadata: { orderId: "o_1" },
      expand: ["payment_intent", "line_items"],
    });
    expect(() => parseStripeForm("metadata[__proto__][x]=1")).toThrow();
  });
});

describe("MIME reading", () => {
  it("decodes quoted-printable, base64 and encoded-word headers", () => {
    const raw = [
      "From: =?UTF-8?Q?Jos=C3=A9?= <jose@shop.test>",
      'To: a@shop.test, "Last, First" <b@shop.test>',
      "Subject: =?UTF-8?B?w5xiZXIgdW5z?=",
      'Content-Type: multipart/alternative; boundary="b1"',
      "",
      "--b1",
      "Content-Type: text/plain; charset=utf-8",
      "Content-Transfer-Encoding: quoted-printable",
      "",
      "Caf=C3=A9 long line that was soft=",
      " wrapped",
      "--b1",
      "Content-Type: text/html; charset=utf-8",
      "Content-Transfer-Encoding: base64",
      "",
      Buffer.from("<p>Café</p>").toString("base64"),
      "--b1--",
      "",
    ].join("\r\n");
    const mail = parseMime(raw);
    expect(mail.from).toBe("jose@shop.test");
    expect(mail.headers["from"]).toBe("José <jose@shop.test>");
    expect(mail.to).toEqual(["a@shop.test", "b@shop.test"]);
    expect(mail.subject).toBe("Über uns");
    expect(mail.text).toBe("Café long line that was soft wrapped");
    expect(mail.html).toBe("<p>Café</p>");
  });
});

describe("Stripe fake persistence", () => {
  it("keeps sessions across a restart when given a state file", async () => {
    const stateFile = path.join(dir, "state.json");
    const first = await startStripeFake({ port: 0, stateFile, log: false });
    const client = (port: number) =>
      new Stripe("sk_test_persist", {
        host: "127.0.0.1",
        port,
        protocol: "http",
        maxNetworkRetries: 0,
        telemetry: false,
      });
    const session = await client(first.port).checkout.sessions.create({
      mode: "payment",
      line_items: [
        {
          price_data: { currency: "eur", unit_amount: 9_900, product_data: { name: "Slip yoke" } },
          quantity: 1,
        },
      ],
      success_url: "http://localhost:3000/ok?s={CHECKOUT_SESSION_ID}",
    });
    await first.close();

    const second = await startStripeFake({ port: 0, stateFile, log: false });
    try {
      const again = await client(second.port).checkout.sessions.retrieve(session.id);
      expect(again.amount_total).toBe(9_900);
      expect(again.currency).toBe("eur");
    } finally {
      await second.close();
    }
  });
});
