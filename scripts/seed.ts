// Seeds an empty database (run by `npm start`; safe to run again): the demo shop in demo mode
// (YOKELINE_DEMO=1), otherwise only the shop row and configuration, with no accounts.
// `npm run seed -- --orders 100000` then adds that many generated orders (with their shafts, work
// orders, steps, step records, payments and timelines) for benchmarks; loopback databases only.
import "reflect-metadata";
import { parseArgs } from "node:util";
import { getOrm } from "@/lib/db/orm";
import { assertLoopbackDatabase } from "@/lib/db/url";
import { seedDemoShop } from "@/lib/demo-seed";
import { generateLargeShop } from "@/lib/demo/large";
import { isDemo } from "@/lib/shop/shop";

async function main() {
  const { values } = parseArgs({
    options: { orders: { type: "string" }, seed: { type: "string" }, "no-events": { type: "boolean" } },
  });
  const orders = values.orders == null ? null : Number(values.orders);
  if (orders != null && (!Number.isInteger(orders) || orders < 1 || orders > 500_000)) {
    throw new Error("--orders takes a whole number from 1 to 500000");
  }
  // Refuse a database on another machine before touching anything.
  if (orders != null) assertLoopbackDatabase();
  const seeded = await seedDemoShop();
  if (!seeded) console.log("A shop is already present; nothing seeded.");
  else if (isDemo()) console.log("Seeded the demo shop (Tallgrass Driveline Works).");
  else {
    console.log("Created the shop (no accounts). Make the first owner with: npm run owner:create -- EMAIL");
  }
  if (orders != null) {
    await generateLargeShop({
      orders,
      seed: values.seed == null ? undefined : Number(values.seed),
      events: !values["no-events"],
      log: (line) => console.log(line),
    });
  }
  await (await getOrm()).close();
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  },
);
