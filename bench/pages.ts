/**
 * The builder page in headless Chromium: JavaScript on first load (gzip) beside the plainest
 * page's (sign-in), target: the builder adds ≤ 60 kB; and its load time beside that page's.
 */
import { gzipSync } from "node:zlib";
import { chromium, type Browser } from "playwright";
import { DEMO_CUSTOMERS, DEMO_PASSWORD } from "../lib/demo";
import { addRow } from "./table";

const TARGET_EXTRA_KB = 60;
const ROUNDS = 5;

async function customerCookies(baseUrl: string): Promise<{ name: string; value: string }[]> {
  const res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl },
    body: JSON.stringify({ email: DEMO_CUSTOMERS[0].email, password: DEMO_PASSWORD }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status}`);
  return res.headers.getSetCookie().map((c) => {
    const [pair] = c.split(";");
    const at = pair!.indexOf("=");
    return { name: pair!.slice(0, at), value: pair!.slice(at + 1) };
  });
}

/** First load of `path` in a fresh context: the JS it fetched (gzip bytes) and the median load time. */
async function measure(
  browser: Browser,
  baseUrl: string,
  path: string,
  cookies: { name: string; value: string }[],
) {
  const times: number[] = [];
  let jsGzip = 0;
  for (let round = 0; round <= ROUNDS; round++) {
    const context = await browser.newContext();
    if (cookies.length) await context.addCookies(cookies.map((c) => ({ ...c, url: baseUrl })));
    const page = await context.newPage();
    const scripts: Promise<number>[] = [];
    if (round === 0)
      page.on("response", (r) => {
        if (r.request().resourceType() === "script")
          scripts.push(
            r.body().then(
              (b) => gzipSync(b).length,
              () => 0,
            ),
          );
      });
    const t0 = performance.now();
    await page.goto(`${baseUrl}${path}`, { waitUntil: "load" });
    const ms = performance.now() - t0;
    if (round === 0) jsGzip = (await Promise.all(scripts)).reduce((a, b) => a + b, 0);
    else times.push(ms); // round 0 warms the server's route
    await context.close();
  }
  times.sort((a, b) => a - b);
  return { jsKb: jsGzip / 1024, loadMs: times[Math.floor(times.length / 2)]! };
}

export async function benchPages(baseUrl: string): Promise<void> {
  console.log("\nbuilder page in headless Chromium (first load, fresh context each time)");
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium" });
  try {
    const plain = await measure(browser, baseUrl, "/sign-in", []);
    const builder = await measure(browser, baseUrl, "/build", await customerCookies(baseUrl));
    const extra = builder.jsKb - plain.jsKb;
    addRow({
      what: "/build: JavaScript on first load (gzip)",
      figure: `${builder.jsKb.toFixed(0)} kB (+${extra.toFixed(0)} kB)`,
      floor: `/sign-in: ${plain.jsKb.toFixed(0)} kB`,
      target: `adds ≤ ${TARGET_EXTRA_KB} kB`,
      met: extra <= TARGET_EXTRA_KB,
    });
    addRow({
      what: "/build: load in headless Chromium (median of 5)",
      figure: `${builder.loadMs.toFixed(0)} ms`,
      floor: `/sign-in: ${plain.loadMs.toFixed(0)} ms`,
      target: "",
      met: null,
    });
  } finally {
    await browser.close();
  }
}
