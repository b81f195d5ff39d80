import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:46002";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
const page = await (await browser.newContext()).newPage();
page.on("console", (m) => m.type() === "error" && console.log("console:", m.text()));
await page.goto(base + "/sign-in");
await page.getByLabel("E-mail").fill("owner@tallgrass.example");
await page.getByLabel("Password").fill("yokeline-demo-2026");
await page.getByRole("button", { name: "Sign in" }).click();
await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
await page.goto(base + "/overview/shafts?state=shipped");
const hrefs = await page.locator('a[href^="/floor/shafts/"]').evaluateAll((as) => as.map((a) => a.getAttribute("href")));
console.log(hrefs.slice(0, 5));
let i = 0;
for (const href of hrefs.slice(0, 8)) {
  await page.goto(base + href);
  const road = await page.getByLabel(/Road speed \(mph\)/).first().isEnabled().catch(() => false);
  if (!road) continue;
  for (const w of [1280, 390]) {
    await page.setViewportSize({ width: w, height: 900 });
    await page.goto(base + href);
    const panel = page.getByRole("region", { name: "Vibration triage" });
    await panel.getByLabel("Road speed (mph)").first().check();
    await panel.getByRole("textbox", { name: "Road speed (mph)" }).fill("70");
    await panel.getByLabel("Under load (accelerating)").check();
    await panel.getByRole("button", { name: "Run triage" }).click();
    await panel.getByText(/^Shaft speed \d+ rpm/).waitFor();
    await panel.screenshot({ path: `/tmp/triage-shots/panel-${w}.png` });
    console.log(href, w, (await panel.getByRole("list", { name: /Likely causes/ }).locator(":scope > li h3").allTextContents()));
  }
  i++;
  break;
}
// empty state: an open shaft
await page.setViewportSize({ width: 1280, height: 900 });
await page.goto(base + "/overview/shafts?state=released");
const open = await page.locator('a[href^="/floor/shafts/"]').first().getAttribute("href");
await page.goto(base + open);
await page.getByRole("region", { name: "Vibration triage" }).screenshot({ path: "/tmp/triage-shots/empty.png" });
await page.pdf?.({ path: "/tmp/triage-shots/print.pdf" }).catch(() => {});
await browser.close();
