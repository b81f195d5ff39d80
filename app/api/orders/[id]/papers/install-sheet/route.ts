import { getEm } from "@/lib/db/orm";
import { installSheetPdf } from "@/lib/floor/papers";
import { route } from "@/lib/http/route";
import { loadOrderForUser } from "@/lib/orders/access";
import { pdfResponse } from "@/lib/http/pdf-response";

// GET /api/orders/[id]/papers/install-sheet — the install sheet PDF, for staff and the owning customer (others 404)
export const GET = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  const em = await getEm();
  const order = await loadOrderForUser(em, user!, params.id);
  return pdfResponse(await installSheetPdf(em, order), `install-sheet-${order.number}.pdf`);
});
