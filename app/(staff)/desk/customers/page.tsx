import type { Metadata } from "next";
import { Users } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { listCustomers } from "@/lib/customers";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Customers" };

export default async function CustomersPage() {
  await requirePermission("orders.desk", "/desk/customers");
  const customers = await listCustomers();
  return (
    <>
      <PageHeader
        title="Customers"
        description="People and businesses the shop builds for, online and by phone."
      />
      {customers.length === 0 ? (
        <EmptyState icon={Users} title="No customers yet">
          Customers appear here when they sign up online or the counter enters a phone order.
        </EmptyState>
      ) : (
        <div className="relative overflow-x-auto card">
          <table className="w-full text-left text-sm">
            <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
              <tr>
                <th scope="col" className="px-4 py-2">
                  Name
                </th>
                <th scope="col" className="px-4 py-2">
                  Company
                </th>
                <th scope="col" className="px-4 py-2">
                  E-mail
                </th>
                <th scope="col" className="px-4 py-2">
                  Phone
                </th>
                <th scope="col" className="px-4 py-2">
                  Orders online
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {customers.map((c) => (
                <tr key={c.id}>
                  <td className="px-4 py-2 font-medium">{c.name}</td>
                  <td className="px-4 py-2">{c.company ?? "—"}</td>
                  <td className="px-4 py-2">{c.email}</td>
                  <td className="px-4 py-2">{c.phone ?? "—"}</td>
                  <td className="px-4 py-2">{c.hasAccount ? "Yes" : "By phone"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
