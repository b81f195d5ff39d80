import { invalidParam, invalidRequest, missingParam } from "./errors";
import type { FormObject, FormValue } from "./form-encoding";
import type { Metadata } from "./types";

/** Typed readers over decoded form params that fail the way Stripe does. */
export function isFormObject(value: FormValue | undefined): value is FormObject {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

export function optionalString(params: FormObject, key: string, param = key): string | null {
  const value = params[key];
  if (value === undefined || value === "") return null;
  if (typeof value !== "string")
    throw invalidParam(param, `Invalid string: ${param}`, "parameter_invalid_string");
  return value;
}

export function requiredString(params: FormObject, key: string, param = key): string {
  const value = optionalString(params, key, param);
  if (value === null) throw missingParam(param);
  return value;
}

export function optionalInteger(params: FormObject, key: string, param = key): number | null {
  const raw = optionalString(params, key, param);
  if (raw === null) return null;
  if (!/^-?\d+$/.test(raw) || !Number.isSafeInteger(Number(raw))) {
    throw invalidParam(param, `Invalid integer: ${raw}`, "parameter_invalid_integer");
  }
  return Number(raw);
}

export function optionalObject(params: FormObject, key: string, param = key): FormObject | null {
  const value = params[key];
  if (value === undefined || value === "") return null;
  if (!isFormObject(value)) throw invalidParam(param, `Invalid object`, "parameter_invalid_object");
  return value;
}

export function optionalArray(params: FormObject, key: string, param = key): FormValue[] | null {
  const value = params[key];
  if (value === undefined || value === "") return null;
  if (!Array.isArray(value)) throw invalidParam(param, `Invalid array`, "parameter_invalid_array");
  return value;
}

export function oneOf<T extends string>(
  value: string | null,
  allowed: readonly T[],
  param: string,
): T | null {
  if (value === null) return null;
  if (!(allowed as readonly string[]).includes(value)) {
    throw invalidParam(
      param,
      `Invalid ${param}: must be one of ${allowed.join(", ")}`,
      "parameter_invalid_string",
    );
  }
  return value as T;
}

export function rejectUnknown(params: FormObject, allowed: ReadonlySet<string>, prefix = ""): void {
  for (const key of Object.keys(params)) {
    if (!allowed.has(key)) {
      const name = prefix ? `${prefix}[${key}]` : key;
      throw invalidRequest(`Received unknown parameter: ${name}`, { code: "parameter_unknown", param: name });
    }
  }
}

/** Stripe's metadata rules: ≤50 keys, key ≤40 chars, value ≤500 chars; "" unsets. */
export function readMetadata(params: FormObject, key = "metadata", param = key): Metadata {
  const raw = optionalObject(params, key, param);
  const out: Metadata = {};
  if (!raw) return out;
  const keys = Object.keys(raw);
  if (keys.length > 50) throw invalidParam(param, "Metadata can have at most 50 keys.");
  for (const k of keys) {
    const v = raw[k];
    if (typeof v !== "string") throw invalidParam(`${param}[${k}]`, `Invalid string: ${param}[${k}]`);
    if (k.length > 40)
      throw invalidParam(`${param}[${k}]`, "Metadata keys can be at most 40 characters long.");
    if (v.length > 500)
      throw invalidParam(`${param}[${k}]`, "Metadata values can be at most 500 characters long.");
    if (v !== "") out[k] = v;
  }
  return out;
}

export function readExpand(params: FormObject): string[] {
  const raw = params["expand"];
  if (raw === undefined) return [];
  const list = Array.isArray(raw) ? raw : [raw];
  return list.filter((v): v is string => typeof v === "string");
}
