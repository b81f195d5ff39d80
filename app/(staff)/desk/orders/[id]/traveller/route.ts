import { WorkOrder } from "@/entities";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { travellerViewFor } from "@/lib/floor/work-orders";
import { AppError } from "@/lib/http/errors";
import { pdfResponse } from "@/lib/http/pdf-response";
import { route } from "@/lib/http/route";
import { loadOrderForUser } from "@/lib/orders/access";
import { renderTravellers } from "@/lib/traveller/pdf";

// GET /desk/orders/:id/traveller — the order's travellers as one PDF, a page per shaft (staff only)
export const GET = route<{ id: string }>({ permission: null }, async ({ params, user }) => {
  // The counter prints at release; the floor reprints a lost or soiled one (same codes).
  if (!can(user!.role, "orders.desk") && !can(user!.role, "floor.scan"))
    throw new AppError("forbidden", "Only the shop prints travellers.");
  const em = await getEm();
  const order = await loadOrderForUser(em, user!, params.id);
  const wos = await em.find(WorkOrder, { order: order.id }, { orderBy: { serialSequence: "asc" } });
  if (!wos.length) throw new AppError("conflict", `Order ${order.number} is not released to the shop yet.`);
  const views = [];
  for (const wo of wos) views.push(await travellerViewFor(em, wo.id));
  const pdf = await renderTravellers(views);
  return pdfResponse(pdf, `traveller-${order.number}.pdf`);
});
