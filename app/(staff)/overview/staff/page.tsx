import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { listStaff } from "@/lib/users/staff";
import { ROLE_LABEL } from "@/lib/navigation";
import { isRole } from "@/lib/auth/roles";
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
        <div className="relative overflow-x-auto card">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Staff accounts</caption>
            <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
              <tr>
                <th scope="col" className="px-4 py-2">
                  Name
                </th>
                <th scope="col" className="px-4 py-2">
                  Role
                </th>
                <th scope="col" className="px-4 py-2">
                  E-mail
                </th>
                <th scope="col" className="px-4 py-2">
                  Since
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {staff.map((s) => (
                <tr key={s.id}>
                  <td className="px-4 py-2 font-medium">{s.name}</td>
                  <td className="px-4 py-2">{isRole(s.role) ? ROLE_LABEL[s.role] : s.role}</td>
                  <td className="px-4 py-2">{s.email}</td>
                  <td className="px-4 py-2">{s.createdAt.slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
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
