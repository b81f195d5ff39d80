import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { LocalFileStorage, newStorageKey } from "@/lib/storage";

let root: string;
let storage: LocalFileStorage;

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), "yokeline-storage-"));
  storage = new LocalFileStorage(root);
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe("local file storage", () => {
  test("put, get and delete round-trip the bytes and the content type", async () => {
    const key = newStorageKey();
    await storage.put(key, new Uint8Array([1, 2, 3]), "image/png");
    const got = await storage.get(key);
    expect(got).toMatchObject({ contentType: "image/png", sizeBytes: 3 });
    expect([...new Uint8Array(await new Response(got!.stream).arrayBuffer())]).toEqual([1, 2, 3]);
    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
    await expect(storage.delete(key)).resolves.toBeUndefined();
  });

  test.each([
    "../../etc/passwd",
    "..",
    "a/b/c/d/e/f",
    "abc.def.ghi",
    "/absolute/path",
    "short",
    "x".repeat(200),
  ])("refuses the key %j", async (key) => {
    await expect(storage.put(key, new Uint8Array([1]), "text/plain")).rejects.toThrow(/Invalid storage key/);
    await expect(storage.get(key)).rejects.toThrow(/Invalid storage key/);
  });
});
