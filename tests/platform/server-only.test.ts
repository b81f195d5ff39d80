import { execFile } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";

/**
 * Every module under lib/ that reaches the database, the ORM, payments, mail, storage or the auth
 * server starts with `import "server-only";`, so a client component that imports one fails the build
 * instead of shipping it to the browser. Scripts run with tsx map the marker to an empty module
 * (scripts/tsconfig.json); the second part checks that this still works and that it is needed.
 */
const root = path.resolve(import.meta.dirname, "../..");

/** Imports (type-only included) that make a module a server module. */
const SERVER_IMPORT =
  /^\s*(?:import|export)\b[^;]*?\bfrom\s+"(@mikro-orm\/[^"]*|@\/lib\/db(?:\/[^"]*)?|pg|pg-boss|stripe|resend|nodemailer|@\/lib\/auth\/server|@\/lib\/(?:storage|payments|mail)(?:\/[^"]*)?|\.\/(?:stripe|local|smtp-transport|resend-transport|outbox))"/m;

/**
 * Server modules that may go without the marker, each with its reason. None today. Deliberately
 * outside the scan: lib/db/url.ts (mikro-orm.config.ts reads it, and the MikroORM CLI loads that
 * through ts-node, where the marker would throw), entities/ and migrations/ (same CLI), and the
 * ports' type-only files (lib/payments/port.ts, lib/storage/port.ts, lib/mail/transport.ts).
 */
const EXCEPTIONS: Record<string, string> = {};

function libFiles(dir: string): string[] {
  return readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = `${dir}/${e.name}`;
    if (e.isDirectory()) return libFiles(rel);
    return /\.tsx?$/.test(e.name) && !e.name.endsWith(".d.ts") ? [rel] : [];
  });
}

const serverModules = libFiles("lib").filter((f) =>
  SERVER_IMPORT.test(readFileSync(path.join(root, f), "utf8")),
);

describe("server-only on every server module", () => {
  it("finds the modules that reach the database (the scan itself works)", () => {
    // A few we know reach the database or a provider; if the scan misses these, it misses others.
    for (const known of [
      "lib/db/orm.ts",
      "lib/orders/queries.ts",
      "lib/orders/access.ts",
      "lib/payments/stripe.ts",
    ])
      expect(serverModules).toContain(known);
    expect(serverModules.length).toBeGreaterThan(60);
  });

  it("each of them imports server-only first", () => {
    const missing = serverModules.filter(
      (f) => !(f in EXCEPTIONS) && !/^import "server-only";$/m.test(readFileSync(path.join(root, f), "utf8")),
    );
    expect(missing, `add import "server-only"; to these (or list them in EXCEPTIONS with a reason)`).toEqual(
      [],
    );
  });

  it("every exception is still a server module (no stale entries)", () => {
    for (const f of Object.keys(EXCEPTIONS)) expect(serverModules).toContain(f);
  });
});

describe("scripts run with tsx", () => {
  const run = promisify(execFile);
  const probe = (tsconfig: string) =>
    run(
      path.join(root, "node_modules/.bin/tsx"),
      ["--tsconfig", tsconfig, "tests/setup/script-import-probe.ts", "lib/orders/queries.ts"],
      { cwd: root, env: { ...process.env, TSX_TSCONFIG_PATH: "" }, timeout: 30_000 },
    );

  it("import server modules through scripts/tsconfig.json", async () => {
    expect((await probe("scripts/tsconfig.json")).stdout).toContain("imported");
  }, 40_000);

  it("cannot import them without it (the marker is real)", async () => {
    const failed = await probe("tsconfig.json").then(
      () => "",
      (e: { stderr: string }) => e.stderr,
    );
    expect(failed).toMatch(/only be used from a Server Component/);
  }, 40_000);
});
