/**
 * Decodes Stripe's form encoding (`a[b][0][c]=1`, `expand[]=x`) into nested
 * objects and arrays, the way the Stripe API reads request parameters.
 */
export type FormValue = string | FormValue[] | FormObject;
export interface FormObject {
  [key: string]: FormValue;
}

const FORBIDDEN_KEYS = new Set(["__proto__", "prototype", "constructor"]);

export class FormEncodingError extends Error {}

function splitKey(key: string): string[] {
  const open = key.indexOf("[");
  if (open <= 0) return [key];
  const segments = [key.slice(0, open)];
  const rest = key.slice(open);
  const re = /\[([^\]]*)\]/g;
  let consumed = 0;
  for (let m = re.exec(rest); m; m = re.exec(rest)) {
    if (m.index !== consumed) throw new FormEncodingError(`Invalid parameter name: ${key}`);
    segments.push(m[1] ?? "");
    consumed = re.lastIndex;
  }
  if (consumed !== rest.length) throw new FormEncodingError(`Invalid parameter name: ${key}`);
  return segments;
}

function isObject(value: FormValue | undefined): value is FormObject {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

// Objects whose keys are all indices ("0", "1", ...) become arrays.
function arrayify(value: FormValue): FormValue {
  if (!isObject(value)) return value;
  const keys = Object.keys(value);
  for (const k of keys) value[k] = arrayify(value[k] as FormValue);
  if (keys.length > 0 && keys.every((k) => /^\d+$/.test(k))) {
    return keys
      .map(Number)
      .sort((a, b) => a - b)
      .map((i) => value[String(i)] as FormValue);
  }
  return value;
}

export function parseStripeForm(body: string): FormObject {
  const root: FormObject = Object.create(null) as FormObject;
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const segments = splitKey(rawKey);
    let node: FormObject = root;
    for (let i = 0; i < segments.length; i++) {
      let seg = segments[i] as string;
      if (FORBIDDEN_KEYS.has(seg)) throw new FormEncodingError(`Invalid parameter name: ${rawKey}`);
      if (seg === "") seg = String(Object.keys(node).length); // `expand[]=a&expand[]=b`
      const last = i === segments.length - 1;
      if (last) {
        node[seg] = value;
      } else {
        const next = node[seg];
        if (isObject(next)) {
          node = next;
        } else {
          const created: FormObject = Object.create(null) as FormObject;
          node[seg] = created;
          node = created;
        }
      }
    }
  }
  for (const k of Object.keys(root)) root[k] = arrayify(root[k] as FormValue);
  return root;
}

/** Stable JSON used to compare idempotent requests regardless of key order. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.keys(value)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`);
    return `{${entries.join(",")}}`;
  }
  return JSON.stringify(value);
}
