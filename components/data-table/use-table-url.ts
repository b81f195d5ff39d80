"use client";
import { useCallback, useTransition } from "react";
import { usePathname, useRouter, useSearchParams } from "next/navigation";

/** Changes to a table's query: a value sets a key, null removes it. */
export type QueryChanges = Record<string, string | null>;

/**
 * The table's state lives in the URL: every change is a navigation (push, so the back button
 * steps back through filters and pages; replace for column choice), which the server page reads.
 */
export function useTableUrl() {
  const router = useRouter();
  const pathname = usePathname();
  const searchParams = useSearchParams();
  const [pending, startTransition] = useTransition();

  const hrefWith = useCallback(
    (changes: QueryChanges, options: { keepPage?: boolean } = {}) => {
      const next = new URLSearchParams(searchParams.toString());
      for (const [key, value] of Object.entries(changes)) {
        if (value == null || value === "") next.delete(key);
        else next.set(key, value);
      }
      if (!options.keepPage && !("page" in changes)) next.delete("page");
      const qs = next.toString();
      return qs ? `${pathname}?${qs}` : pathname;
    },
    [pathname, searchParams],
  );

  const navigate = useCallback(
    (changes: QueryChanges, options: { replace?: boolean; keepPage?: boolean } = {}) => {
      const href = hrefWith(changes, options);
      startTransition(() => {
        if (options.replace) router.replace(href, { scroll: false });
        else router.push(href, { scroll: false });
      });
    },
    [hrefWith, router],
  );

  return { navigate, hrefWith, pending, searchParams, pathname };
}
