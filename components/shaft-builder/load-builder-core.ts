"use client";

import { useEffect, useState } from "react";

export type BuilderCore = typeof import("./builder-core");

let loading: Promise<BuilderCore> | null = null;

/** The builder's engineering (builder-core.ts), fetched once; a failed fetch is tried again next time. */
export function loadBuilderCore(): Promise<BuilderCore> {
  loading ??= import("./builder-core").catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}

/** The builder's engineering, or null when it could not be fetched (the caller says so and stops). */
export async function tryLoadBuilderCore(): Promise<BuilderCore | null> {
  return loadBuilderCore().catch(() => null);
}

/**
 * The builder's engineering once `wanted` (null until it has arrived). A failed fetch (a dropped
 * connection) is tried again a few seconds later, so live results never stay off for good.
 */
export function useBuilderCore(wanted: boolean): BuilderCore | null {
  const [core, setCore] = useState<BuilderCore | null>(null);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    if (!wanted || core) return;
    let live = true;
    let retry: ReturnType<typeof setTimeout> | undefined;
    loadBuilderCore().then(
      (m) => live && setCore(() => m),
      () => {
        if (live) retry = setTimeout(() => setAttempt((n) => n + 1), 3000);
      },
    );
    return () => {
      live = false;
      clearTimeout(retry);
    };
  }, [wanted, core, attempt]);
  return core;
}
