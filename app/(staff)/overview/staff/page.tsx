import type { Metadata } from "next";
import { UserPlus } from "lucide-react";
import { formatDate, formatDateTime } from "@/lib/dates";
import { getShopLocale } from "@/lib/shop/locale";
import { requirePermission } from "@/lib/auth/guard";
import { isStaffRole, STAFF_ROLES } from "@/lib/auth/roles";
import { ROLE_LABEL } from "@/lib/navigation";
import { listStaff } from "@/lib/users/staff";
import { listOpenInvitations } from "@/lib/users/invitations";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { InviteStaffForm } from "./_components/invite-staff-form";
import { PendingInvitations, type InvitationView } from "./_components/pending-invitations";
import { StaffTable, type StaffMemberView } from "./_components/staff-table";

export const metadata: Metadata = { title: "Staff" };

/** What each role may do, short enough for the role picker on a phone. */
const ROLE_SHORT = {
  counter: "orders, payments",
  floor: "scans, measurements",
  owner: "everything",
} as const;

export default async function StaffPage() {
  const me = await requirePermission("staff.manage", "/overview/staff");
  const [staff, invitations, { timeZone }] = await Promise.all([
    listStaff(),
    listOpenInvitations(),
    getShopLocale(),
  ]);
  // Times in the shop's zone, as the order timeline shows them.
  const when = (iso: string) => formatDateTime(iso, timeZone);
  const day = (iso: string) => formatDate(iso, timeZone);
  const roles = STAFF_ROLES.map((r) => ({ value: r, label: ROLE_LABEL[r] }));
  const members: StaffMemberView[] = staff.flatMap((s) =>
    isStaffRole(s.role)
      ? [
          {
            id: s.id,
            name: s.name,
            email: s.email,
            role: s.role,
            roleLabel: ROLE_LABEL[s.role],
            active: !s.deactivatedAt,
            lastSignIn: s.lastSignInAt ? when(s.lastSignInAt) : null,
            isSelf: s.id === me.id,
          },
        ]
      : [],
  );
  const invitationViews: InvitationView[] = invitations.map((i) => ({
    id: i.id,
    name: i.name,
    email: i.email,
    roleLabel: ROLE_LABEL[i.role],
    sent: day(i.sentAt),
    sendCount: i.sendCount,
    expires: day(i.expiresAt),
    expired: i.expired,
    invitedBy: i.invitedBy,
  }));

  return (
    <>
      <PageHeader
        title="Staff"
        description="Counter, floor and owner accounts. Customers create their own."
      />
      <div className="grid gap-6 2xl:grid-cols-[1fr_22rem]">
        <div className="min-w-0 space-y-8">
          <section aria-labelledby="staff-accounts">
            <h2 id="staff-accounts" className="mb-3 text-lg font-semibold">
              Accounts
            </h2>
            {members.length === 0 ? (
              <EmptyState icon={UserPlus} title="No staff yet">
                Invite the people who take orders and work the floor.
              </EmptyState>
            ) : (
              <StaffTable members={members} roles={roles} />
            )}
          </section>
          <section aria-labelledby="staff-invitations">
            <h2 id="staff-invitations" className="mb-3 text-lg font-semibold">
              Pending invitations
            </h2>
            <PendingInvitations invitations={invitationViews} />
          </section>
        </div>
        <section className="h-fit max-w-xl card p-5 2xl:max-w-none" aria-labelledby="new-staff">
          <h2 id="new-staff" className="text-lg font-semibold">
            Invite a staff member
          </h2>
          <p className="field-hint mb-4">
            They get an e-mail with a link to choose their own password (valid seven days, once).
          </p>
          <InviteStaffForm
            roles={STAFF_ROLES.map((r) => ({ value: r, label: `${ROLE_LABEL[r]} — ${ROLE_SHORT[r]}` }))}
          />
        </section>
      </div>
    </>
  );
}
