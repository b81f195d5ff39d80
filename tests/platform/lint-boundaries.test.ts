import path from "node:path";
import { ESLint } from "eslint";
import { beforeAll, describe, expect, it } from "vitest";

/**
 * The ESLint boundary rules of eslint.config.mjs, run on small sources as if they were files of the
 * project: components get view models (no entities, ORM or database, `import type` included), and
 * the engineering core stays pure.
 */
const root = path.resolve(import.meta.dirname, "../..");
let eslint: ESLint;

async function problems(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, filePath) });
  return (result?.messages ?? [])
    .filter((m) => m.ruleId === "yokeline/client-boundary" || m.ruleId === "no-restricted-imports")
    .map((m) => m.message);
}

describe("ESLint boundaries", () => {
  beforeAll(() => {
    eslint = new ESLint({ cwd: root });
  });

  it("components/ may not import entities, not even their types", async () => {
    const found = await problems(
      "components/orders/boundary-probe.tsx",
      `import type { Order } from "@/entities";\nexport function P({ o }: { o: Order }) { return <p>{o.number}</p>; }\n`,
    );
    expect(found).toEqual([expect.stringContaining("@/entities")]);
  }, 60_000);

  it("a route's _components/ may not import the ORM or the entity manager", async () => {
    const found = await problems(
      "app/(staff)/desk/_components/boundary-probe.tsx",
      `import type { EntityManager } from "@mikro-orm/postgresql";\nimport { getEm } from "@/lib/db/orm";\nexport const x = (em: EntityManager) => [em, getEm];\n`,
    );
    expect(found).toHaveLength(2);
  });

  it('a "use client" file anywhere may not import entities (relative paths and re-exports too)', async () => {
    const found = await problems(
      "app/(shop)/orders/boundary-probe.tsx",
      `"use client";\nexport { Order } from "../../../entities";\n`,
    );
    expect(found).toEqual([expect.stringContaining("entities")]);
  });

  it("view-model modules (lib/*/views.ts) name no entity types", async () => {
    const found = await problems(
      "lib/orders/views.ts",
      `import type { WarningAcknowledgement } from "@/entities";\nexport interface V { acks: WarningAcknowledgement[] }\n`,
    );
    expect(found).toEqual([expect.stringContaining("@/entities")]);
  });

  it("pages (server components) still load data", async () => {
    const found = await problems(
      "app/(shop)/orders/boundary-probe/page.tsx",
      `import { getEm } from "@/lib/db/orm";\nimport { Order } from "@/entities";\nexport default async function P() { const o = await (await getEm()).findOne(Order, {}); return <p>{o?.number}</p>; }\n`,
    );
    expect(found).toEqual([]);
  });

  it("lib/driveline stays free of I/O and app modules", async () => {
    const found = await problems(
      "lib/driveline/boundary-probe.ts",
      `import { readFileSync } from "node:fs";\nimport { getEm } from "@/lib/db/orm";\nexport const x = [readFileSync, getEm];\n`,
    );
    expect(found).toHaveLength(2);
  });
});
