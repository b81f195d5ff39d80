import { describe, expect, test } from "vitest";
import { renderEmail, TEMPLATE_NAMES } from "@/lib/mail";
import { SAMPLE_PROPS } from "./sample-props";

const shop = {
  name: "Tallgrass Driveline Works",
  addressLines: "400 Mill Road\nSpringfield",
  phone: "555-0100",
  email: "shop@tallgrass.example",
};

/** Account e-mails carry no order; they are checked on their own below. */
const ACCOUNT_TEMPLATES = ["verify-email", "customer-invite", "staff-invite"] as const;
const ORDER_TEMPLATES = TEMPLATE_NAMES.filter((n) => !(ACCOUNT_TEMPLATES as readonly string[]).includes(n));

describe("e-mail templates", () => {
  test.each(ACCOUNT_TEMPLATES)(
    "%s carries its one-time link in both versions, with the shop",
    async (name) => {
      const email = await renderEmail(name, SAMPLE_PROPS[name] as never, shop);
      const url = SAMPLE_PROPS[name].url;
      expect(email.html).toMatch(/^<!DOCTYPE html/i);
      expect(email.html).toContain(`href="${url.replace(/&/g, "&amp;")}"`);
      expect(email.html).toContain("Tallgrass Driveline Works");
      expect(email.text).toContain(url);
      expect(email.text.toLowerCase()).toContain("marisol ortiz");
    },
  );

  test.each(ORDER_TEMPLATES)(
    "%s renders HTML and plain text with the order number and the shop",
    async (name) => {
      const email = await renderEmail(name, SAMPLE_PROPS[name] as never, shop);
      expect(email.subject).toContain("Y26-0042");
      expect(email.html).toMatch(/^<!DOCTYPE html/i);
      expect(email.html).toContain("Y26-0042");
      expect(email.html).toContain("Tallgrass Driveline Works");
      expect(email.html).toContain("400 Mill Road");
      expect(email.text).toContain("Y26-0042");
      expect(email.text).not.toMatch(/<[a-z]/i);
      expect(email.text.toLowerCase()).toContain("marisol ortiz");
    },
  );

  test("balance-due has a pay button to the payment link, in both versions", async () => {
    const email = await renderEmail("balance-due", SAMPLE_PROPS["balance-due"], shop);
    expect(email.html).toMatch(
      /<a[^>]+href="http:\/\/127\.0\.0\.1:12111\/checkout\/cs_test_balance"[^>]*>[\s\S]*?Pay \$354\.78/,
    );
    expect(email.text).toContain("http://127.0.0.1:12111/checkout/cs_test_balance");
  });

  test("order-received lists the lines and the total", async () => {
    const email = await renderEmail("order-received", SAMPLE_PROPS["order-received"], shop);
    expect(email.text).toContain("Rear driveshaft, YL-X41 joints");
    expect(email.text).toContain("$709.56");
    expect(email.text).toContain("Thursday 24 December 2026");
  });

  test("props are escaped, not injected", async () => {
    const email = await renderEmail(
      "shaft-ready",
      { ...SAMPLE_PROPS["shaft-ready"], customerName: "<script>x</script>" },
      shop,
    );
    expect(email.html).not.toContain("<script>x</script>");
    expect(email.html).toContain("&lt;script&gt;");
  });
});
