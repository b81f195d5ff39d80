/**
 * Serial numbers and step codes (pure).
 *
 * Serial: `SHOP-YY-NNNNN-C`, e.g. `TGW-26-00042-7` — the shop's 2–4 letter code, the two-digit
 * release year, a five-digit sequence within that year, and a check character. It is marked on
 * the shaft and stays with it for life.
 *
 * Step code (the text of each step's Code 128): `SERIAL-STEP-RN-C`, e.g. `TGW-26-00042-7-WLD-R1-K`,
 * the step's routing code, the traveller revision and a check character over all of it, so a
 * mistyped or misread scan is refused instead of signing off the wrong step.
 *
 * Check characters are ISO/IEC 7064 MOD 37,36 (hybrid system over 0–9 A–Z): every single-character
 * error changes the check character, and all but a few swaps of two adjacent characters do. Only letters,
 * digits and hyphens are used, which every keyboard-wedge scanner types the same on any layout.
 */

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ";
const M = 36;

/** ISO/IEC 7064 MOD 37,36 check character for `text` (hyphens ignored; 0–9 A–Z only). */
export function checkCharacter(text: string): string {
  let p = M;
  for (const ch of text.replace(/-/g, "")) {
    const v = ALPHABET.indexOf(ch);
    if (v < 0) throw new Error(`"${ch}" is not allowed in a code`);
    let s = (p + v) % M;
    if (s === 0) s = M;
    p = (s * 2) % (M + 1);
  }
  return ALPHABET[(M + 1 - p) % M]!;
}

/** True when the last character of `text` is the check character of the rest. */
function hasValidCheck(text: string): boolean {
  const body = text.slice(0, -1);
  const last = text.slice(-1);
  try {
    return checkCharacter(body) === last;
  } catch {
    return false;
  }
}

export interface SerialParts {
  shopCode: string;
  /** Four-digit year. */
  year: number;
  sequence: number;
}

const SHOP_CODE = /^[A-Z]{2,4}$/;
const SERIAL = /^([A-Z]{2,4})-(\d{2})-(\d{5})-([0-9A-Z])$/;
const STEP = /^[A-Z]{3}$/;

/** Makes the serial of the `sequence`-th shaft released in `year` (1-based within the year). */
export function formatSerial({ shopCode, year, sequence }: SerialParts): string {
  if (!SHOP_CODE.test(shopCode)) throw new Error("The shop code must be 2–4 letters A–Z");
  if (!Number.isInteger(sequence) || sequence < 1 || sequence > 99_999) {
    throw new Error("The sequence must be 1–99999");
  }
  const body = `${shopCode}-${String(year % 100).padStart(2, "0")}-${String(sequence).padStart(5, "0")}`;
  return `${body}-${checkCharacter(body)}`;
}

/** Upper-cases and trims what a scanner or a person typed. */
export function normaliseCode(text: string): string {
  return text.trim().toUpperCase().replace(/\s+/g, "");
}

export type ParsedSerial = { ok: true; serial: string; parts: SerialParts } | { ok: false; message: string };

export function parseSerial(text: string): ParsedSerial {
  const serial = normaliseCode(text);
  const m = SERIAL.exec(serial);
  if (!m) return { ok: false, message: `"${serial}" is not a shaft serial (like TGW-26-00042-7)` };
  if (!hasValidCheck(serial.replace(/-/g, ""))) {
    return {
      ok: false,
      message: `"${serial}" fails its check character: scan it again or type it carefully`,
    };
  }
  return {
    ok: true,
    serial,
    parts: { shopCode: m[1]!, year: 2000 + Number(m[2]), sequence: Number(m[3]) },
  };
}

export interface StepCodeParts {
  serial: string;
  /** The routing step's three-letter code, e.g. "CUT". */
  step: string;
  revision: number;
}

/** The text of a step's barcode; the same inputs always give the same code (reprints match). */
export function formatStepCode({ serial, step, revision }: StepCodeParts): string {
  if (!parseSerial(serial).ok) throw new Error(`"${serial}" is not a valid serial`);
  if (!STEP.test(step)) throw new Error("A step code is three letters A–Z");
  if (!Number.isInteger(revision) || revision < 1 || revision > 999) throw new Error("Revision 1–999");
  const body = `${serial}-${step}-R${revision}`;
  return `${body}-${checkCharacter(body)}`;
}

export type ParsedStepCode = ({ ok: true } & StepCodeParts) | { ok: false; message: string };

/** Validates a scanned step code: shape, then check character (a misread is refused). */
export function parseStepCode(text: string): ParsedStepCode {
  const code = normaliseCode(text);
  const m = /^([A-Z]{2,4}-\d{2}-\d{5}-[0-9A-Z])-([A-Z]{3})-R(\d{1,3})-([0-9A-Z])$/.exec(code);
  if (!m) {
    return {
      ok: false,
      message: `"${code}" is not a traveller step code (like TGW-26-00042-7-CUT-R1-X): scan the step's barcode`,
    };
  }
  if (!hasValidCheck(code.replace(/-/g, ""))) {
    return { ok: false, message: `"${code}" fails its check character: scan it again or type it carefully` };
  }
  const serial = parseSerial(m[1]!);
  if (!serial.ok) return serial;
  return { ok: true, serial: serial.serial, step: m[2]!, revision: Number(m[3]) };
}
