import { randomBytes } from "node:crypto";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

function randomToken(length: number): string {
  const bytes = randomBytes(length);
  let out = "";
  for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
  return out;
}

/** Stripe-looking ids, e.g. `newId("cs_test")` → `cs_test_a1B2...`. */
export function newId(prefix: string, length = 24): string {
  return `${prefix}_${randomToken(length)}`;
}

export function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}
