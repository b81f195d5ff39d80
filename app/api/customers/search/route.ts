import { searchCustomers } from "@/lib/customers";
import { searchCustomersQuerySchema } from "@/lib/customers-schemas";
import { json, route } from "@/lib/http/route";

// GET /api/customers/search?q=&limit= — the counter finds a customer by name, phone, e-mail or company
export const GET = route({ permission: "orders.desk" }, async ({ req }) => {
  const { q, limit } = searchCustomersQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return json({ customers: await searchCustomers(q, limit) });
});
