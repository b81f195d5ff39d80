/** `npm run bench`: each bench in turn (keep this a plain list of calls). */
import { benchDriveline } from "./driveline";
import { benchApi } from "./api";
import { benchTraveller } from "./traveller";

async function main(): Promise<void> {
  await benchDriveline();
  await benchTraveller();
  if (process.env.BENCH_BASE_URL) await benchApi(process.env.BENCH_BASE_URL);
  else console.log("\nAPI latency: skipped (run through `npm run bench`, which starts the app).");
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
