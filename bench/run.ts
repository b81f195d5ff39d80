/** `npm run bench`: each bench in turn (keep this a plain list of calls). */
import { benchDriveline } from "./driveline";

async function main(): Promise<void> {
  await benchDriveline();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
