// Seeds the demo shop when the database is empty (run by `npm start`; safe to run again).
import "reflect-metadata";
import { getOrm } from "@/lib/db/orm";
import { seedDemoShop } from "@/lib/demo-seed";

async function main() {
  const seeded = await seedDemoShop();
  console.log(
    seeded
      ? "Seeded the demo shop (Tallgrass Driveline Works)."
      : "Demo shop already present; nothing seeded.",
  );
  await (await getOrm()).close();
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
