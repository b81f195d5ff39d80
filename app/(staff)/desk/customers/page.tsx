import type { Metadata } from "next";
import { Users } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { listCustomers } from "@/lib/customers";
import { CELL, TableCard } from "@/components/ui/table-card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { InviteButton } from "@/components/customers/invite-button";

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
        <TableCard caption="Customers" headings={["Name", "Company", "E-mail", "Phone", "Orders online"]}>
          {customers.map((c) => (
            <tr key={c.id}>
              <td className={`${CELL} font-medium`}>{c.name}</td>
              <td className={CELL}>{c.company ?? "—"}</td>
              <td className={CELL}>{c.email}</td>
              <td className={CELL}>{c.phone ?? "—"}</td>
              <td className={CELL}>
                {c.hasAccount ? (
                  "Yes"
                ) : (
                  <span className="inline-flex flex-wrap items-center gap-2">
                    By phone <InviteButton customerId={c.id} />
                  </span>
                )}
              </td>
            </tr>
          ))}
        </TableCard>
      )}
    </>
  );
}
