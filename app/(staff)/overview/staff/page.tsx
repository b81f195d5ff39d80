import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { listStaff } from "@/lib/users/staff";
import { ROLE_LABEL } from "@/lib/navigation";
import { isRole } from "@/lib/auth/roles";
import { CELL, TableCard } from "@/components/ui/table-card";
import { PageHeader } from "@/components/ui/page-header";
import { CreateStaffForm } from "./_components/create-staff-form";

export const metadata: Metadata = { title: "Staff" };

export default async function StaffPage() {
  await requirePermission("staff.manage", "/overview/staff");
  const staff = await listStaff();
  return (
    <>
      <PageHeader
        title="Staff"
        description="Counter, floor and owner accounts. Customers create their own."
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <TableCard caption="Staff accounts" headings={["Name", "Role", "E-mail", "Since"]}>
          {staff.map((s) => (
            <tr key={s.id}>
              <td className={`${CELL} font-medium`}>{s.name}</td>
              <td className={CELL}>{isRole(s.role) ? ROLE_LABEL[s.role] : s.role}</td>
              <td className={CELL}>{s.email}</td>
              <td className={CELL}>{s.createdAt.slice(0, 10)}</td>
            </tr>
          ))}
        </TableCard>
        <section className="card p-5" aria-labelledby="new-staff">
          <h2 id="new-staff" className="text-lg font-semibold">
            Add a staff member
          </h2>
          <p className="field-hint mb-4">Give them the password in person; they sign in with their e-mail.</p>
          <CreateStaffForm />
        </section>
      </div>
    </>
  );
}
