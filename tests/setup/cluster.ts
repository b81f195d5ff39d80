/**
 * A PostgreSQL cluster of a test's own, stopped and started through scripts/pg.sh (the same code
 * `npm start` and `npm test` use), for the tests that take the database away under the app.
 */
import { execFile } from "node:child_process";
import net from "node:net";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "../..");

/** Runs one of scripts/pg.sh's functions without blocking the event loop (pools must see it happen). */
export function pg(fn: string, ...args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    execFile(
      "bash",
      ["-c", `source scripts/pg.sh; ${fn} "$@"`, "pg", ...args],
      { cwd: root, timeout: 60_000 },
      (err, _out, stderr) => (err ? reject(new Error(`${fn}: ${stderr || err.message}`)) : resolve()),
    );
  });
}

/** A TCP port nothing listens on just now. */
export async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const srv = net.createServer().listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

/** Closes the app's ORM of this process (it points at the cluster about to go). */
export function closeAppOrm(): void {
  const g = globalThis as { yokelineOrm?: Promise<{ close(force?: boolean): Promise<void> }> };
  void g.yokelineOrm?.then((orm) => orm.close(true)).catch(() => undefined);
  g.yokelineOrm = undefined;
}
