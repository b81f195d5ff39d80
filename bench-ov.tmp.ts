import { benchOverview } from "./bench/overview";
void benchOverview().then(() => process.exit(0), (e) => { console.error(e); process.exit(1); });
