// Run by tests/db/request-em.test.ts under React's react-server condition (as Next runs server
// components): one render asks for the request's entity manager several times; code outside a
// render asks twice. Prints what it saw as JSON.
import { Writable } from "node:stream";
import { createElement } from "react";
// React's own Flight server, as Next bundles it (node build).
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { renderToPipeableStream } = require("next/dist/compiled/react-server-dom-webpack/server.node") as {
  renderToPipeableStream(model: unknown, config: unknown): { pipe(w: Writable): void };
};
import { freshEm, getEm, getOrm } from "@/lib/db/orm";

async function main() {
  const seen: Record<string, boolean> = {};
  let pageEm: unknown;
  let pageDone = () => {};
  const pageDid = new Promise<void>((r) => (pageDone = r));
  async function Page() {
    const [a, b] = await Promise.all([getEm(), getEm()]);
    pageEm = a;
    const c = await getEm();
    seen.sameInRender = a === b && b === c;
    seen.freshInRender = (await freshEm()) !== a;
    pageDone();
    return null;
  }
  async function Other() {
    await pageDid;
    seen.otherComponentShares = (await getEm()) === pageEm;
    return null;
  }
  await new Promise<void>((resolve, reject) => {
    const sink = new Writable({ write: (_c, _e, next) => next(), final: (done) => (done(), resolve()) });
    sink.on("error", reject);
    renderToPipeableStream(createElement("div", null, createElement(Page), createElement(Other)), {}).pipe(
      sink,
    );
  });
  const [x, y] = [await getEm(), await getEm()];
  seen.freshOutside = x !== y;
  await (await getOrm()).close(true);
  console.log(JSON.stringify(seen));
}
main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
