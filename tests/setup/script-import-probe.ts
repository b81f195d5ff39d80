// Run by tests/platform/server-only.test.ts with tsx, as the scripts are: imports one module
// (argv[2], relative to the checkout) and says so.
import path from "node:path";

const target = path.resolve(process.argv[2] ?? "lib/db/orm.ts");
import(target).then(
  () => {
    console.log("imported");
    process.exit(0);
  },
  (err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
