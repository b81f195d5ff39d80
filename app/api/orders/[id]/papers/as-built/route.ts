import { getEm } from "@/lib/db/orm";
import { asBuiltPdf } from "@/lib/floor/papers";
import { route } from "@/lib/http/route";
import { loadOrderForUser } from "@/lib/orders/access";
import { pdfResponse } from "@/lib/http/pdf-response";

// GET /api/orders/[id]/papers/as-built — the as-built certificate PDF once final inspection passed (else 409); staff and the owning customer
export const GET = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  const em = await getEm();
  const order = await loadOrderForUser(em, user!, params.id);
  return pdfResponse(await asBuiltPdf(em, order), `as-built-${order.number}.pdf`);
});
