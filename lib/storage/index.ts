import "server-only";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { LocalFileStorage } from "./local";
import type { FileStorage } from "./port";

export { LocalFileStorage } from "./local";
export {
  assertStorageKey,
  InvalidStorageKeyError,
  STORAGE_KEY,
  type FileStorage,
  type StoredFile,
} from "./port";

const cache = new Map<string, FileStorage>();

/** The configured storage: a local folder, UPLOADS_DIR (default `.data/uploads`). */
export function getStorage(): FileStorage {
  const root = path.resolve(process.env.UPLOADS_DIR ?? ".data/uploads");
  let storage = cache.get(root);
  if (!storage) {
    storage = new LocalFileStorage(root);
    cache.set(root, storage);
  }
  return storage;
}

/** A new key for an object: a random uuid, never derived from anything the user sent. */
export function newStorageKey(): string {
  return randomUUID();
}
