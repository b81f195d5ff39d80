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

/** BENCH_ONLY=api,scan… runs only those benches (names below); unset: every one. */
const only = process.env.BENCH_ONLY?.split(",").map((s) => s.trim());
const wanted = (name: string) => !only || only.includes(name);

async function main(): Promise<void> {
  if (wanted("driveline")) await benchDriveline();
  if (wanted("traveller")) await benchTraveller();
  // The scan bench scans the shaft the floor bench releases.
  const floor = wanted("floor") || wanted("scan") ? await benchFloor() : null;
  if (process.env.BENCH_BASE_URL) {
    if (wanted("api")) await benchApi(process.env.BENCH_BASE_URL);
    if (wanted("scan")) await benchScan(process.env.BENCH_BASE_URL, floor?.scanCode ?? null);
    if (wanted("tables")) await benchTables(process.env.BENCH_BASE_URL);
    if (wanted("pages")) await benchPages(process.env.BENCH_BASE_URL);
  } else
    console.log(
      "\nAPI latency and the scan route: skipped (run through `npm run bench`, which starts the app).",
    );
  // Last: it fills the bench database with a large shop.
  if (wanted("overview")) await benchOverview();
  console.log("\nOne table (paste into the README's Performance section after a quiet run):\n");
  console.log(benchTable());
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
