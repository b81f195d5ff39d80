import { appUrl } from "./app-url";

// C0 controls, DEL and C1 controls: browsers strip or reinterpret them, so a path holding one
// may not be the path it looks like.
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;

/**
 * A same-origin path to return to after sign-in, or null. The value is resolved the way the
 * browser will resolve it (against the app's own address) and kept only when the origin stays
 * ours: "//evil.example", "/\\evil.example", tabs and newlines inside "//" and the like all
 * resolve to another host. Returns the normalised path, query and fragment.
 */
export function safeNextPath(value: unknown, base: string = appUrl()): string | null {
  if (typeof value !== "string" || value.length === 0 || value.length > 500) return null;
  if (!value.startsWith("/") || CONTROL.test(value) || value.includes("\\")) return null;
  let own: URL;
  let resolved: URL;
  try {
    own = new URL(base);
    resolved = new URL(value, own);
  } catch {
    return null;
  }
  if (resolved.origin !== own.origin) return null;
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  // A path that decodes to "//host" would be another host once a later step decodes it.
  if (path.startsWith("//") || /^\/(%2f|%5c)/i.test(path)) return null;
  return path;
}
