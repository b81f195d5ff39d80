// Refuses a production run (NODE_ENV=production, YOKELINE_DEMO unset) on unsafe settings, before
// start.sh touches the database; the server itself checks again in instrumentation.ts.
import { refuseUnsafeProduction } from "@/lib/config/production";

refuseUnsafeProduction(process.env, "Yokeline");
