/** `npm run bench`: each bench in turn (keep this a plain list of calls). */
import { benchDriveline } from "./driveline";
import { benchApi } from "./api";
import { benchTraveller } from "./traveller";
import { benchFloor } from "./floor";
import { benchScan } from "./scan";
import { benchOverview } from "./overview";
import { benchTables } from "./tables";
import { benchPages } from "./pages";
import { benchTable } from "./table";

async function main(): Promise<void> {
  await benchDriveline();
  await benchTraveller();
  const floor = await benchFloor();
  if (process.env.BENCH_BASE_URL) {
    await benchApi(process.env.BENCH_BASE_URL);
    await benchScan(process.env.BENCH_BASE_URL, floor?.scanCode ?? null);
    await benchTables(process.env.BENCH_BASE_URL);
    await benchPages(process.env.BENCH_BASE_URL);
  } else
    console.log(
      "\nAPI latency and the scan route: skipped (run through `npm run bench`, which starts the app).",
    );
  // Last: it fills the bench database with a large shop.
  await benchOverview();
  console.log("\nOne table (paste into the README's Performance section after a quiet run):\n");
  console.log(benchTable());
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
