/** A same-site path to return to after sign-in, or null (never an absolute or protocol-relative URL). */
export function safeNextPath(value: unknown): string | null {
  if (typeof value !== "string" || !value.startsWith("/") || value.startsWith("//") || value.includes("\\"))
    return null;
  return value.slice(0, 500);
}
