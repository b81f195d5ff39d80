// Before the app starts: release what the demo seed leaves paid but not released (the app's
// once-a-minute sweep would otherwise do it a minute into the run, its first release loading cold
// code in the middle of a measurement).
import "reflect-metadata";
import { getOrm } from "@/lib/db/orm";
import { releasePaidOrders } from "@/lib/floor/release-sweep";

async function main() {
  const released = await releasePaidOrders({ olderThanSeconds: 0 });
  console.log(`released ${released.length} paid order(s) before the run`);
  await (await getOrm()).close();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
