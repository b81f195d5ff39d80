import "server-only";
import { randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { mkdir, readFile, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import { Readable } from "node:stream";
import { assertStorageKey, type FileStorage, type StoredFile } from "./port";

/**
 * Files in a folder on this machine: `<root>/<first two characters>/<key>` plus a small
 * `<key>.json` beside it with the content type. Keys are checked against a strict pattern and the
 * resolved path must stay under the root, so no key can reach outside it.
 */
export class LocalFileStorage implements FileStorage {
  private readonly root: string;

  constructor(root: string) {
    this.root = path.resolve(root);
  }

  private pathOf(key: string): string {
    assertStorageKey(key);
    const file = path.resolve(this.root, key.slice(0, 2).toLowerCase(), key);
    if (!file.startsWith(this.root + path.sep)) throw new Error("Storage path escapes the root.");
    return file;
  }

  async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
    const file = this.pathOf(key);
    await mkdir(path.dirname(file), { recursive: true });
    // Write to a temporary name and rename, so a reader never sees half a file.
    const temp = `${file}.${randomUUID()}.tmp`;
    await writeFile(temp, bytes, { flag: "wx" });
    await writeFile(`${file}.json`, JSON.stringify({ contentType, sizeBytes: bytes.byteLength }));
    await rename(temp, file);
  }

  async get(key: string): Promise<StoredFile | null> {
    const file = this.pathOf(key);
    try {
      const [info, meta] = await Promise.all([stat(file), readFile(`${file}.json`, "utf8")]);
      const { contentType } = JSON.parse(meta) as { contentType?: string };
      const stream = Readable.toWeb(createReadStream(file)) as ReadableStream<Uint8Array>;
      return { stream, contentType: contentType ?? "application/octet-stream", sizeBytes: info.size };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    const file = this.pathOf(key);
    await Promise.all([rm(file, { force: true }), rm(`${file}.json`, { force: true })]);
  }
}
