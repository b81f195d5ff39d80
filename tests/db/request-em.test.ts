import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { expect } from "vitest";
import { dbTest } from "../setup/db";

/**
 * One entity manager per request: inside one React server render every `getEm()` is the same fork
 * (React's cache()), while outside a render (route handlers, actions, jobs, scripts) each call is a
 * fork of its own, and `freshEm()` always is. Run in a child process under the react-server
 * condition, with React's own Flight renderer, since that is where cache() memoizes.
 */
const root = path.resolve(import.meta.dirname, "../..");

dbTest(
  "one entity manager per server render, a fresh one per call elsewhere",
  async ({ database }) => {
    const { stdout } = await promisify(execFile)(
      path.join(root, "node_modules/.bin/tsx"),
      ["--conditions=react-server", "--tsconfig", "scripts/tsconfig.json", "tests/setup/request-em-probe.ts"],
      { cwd: root, env: { ...process.env, DATABASE_URL: database }, timeout: 40_000 },
    );
    expect(JSON.parse(stdout.trim().split("\n").at(-1) ?? "{}")).toEqual({
      sameInRender: true,
      otherComponentShares: true,
      freshInRender: true,
      freshOutside: true,
    });
  },
  60_000,
);
