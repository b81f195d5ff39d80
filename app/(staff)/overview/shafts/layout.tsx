import { requirePermission } from "@/lib/auth/guard";

/**
 * Decides access before loading.tsx streams its skeleton: a refusal inside the page (below the
 * loading boundary) could only answer 200, not 403 or the redirect to sign-in.
 */
export default async function AccessLayout({ children }: { children: React.ReactNode }) {
  await requirePermission("shop.overview", "/overview/shafts");
  return children;
}
