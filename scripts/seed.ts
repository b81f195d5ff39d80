// Seeds an empty database (run by `npm start`; safe to run again): the demo shop in demo mode
// (YOKELINE_DEMO=1), otherwise only the shop row and configuration, with no accounts.
import "reflect-metadata";
import { getOrm } from "@/lib/db/orm";
import { seedDemoShop } from "@/lib/demo-seed";
import { isDemo } from "@/lib/shop/shop";

async function main() {
  const seeded = await seedDemoShop();
  if (!seeded) console.log("A shop is already present; nothing seeded.");
  else if (isDemo()) console.log("Seeded the demo shop (Tallgrass Driveline Works).");
  else {
    console.log("Created the shop (no accounts). Make the first owner with: npm run owner:create -- EMAIL");
  }
  await (await getOrm()).close();
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
