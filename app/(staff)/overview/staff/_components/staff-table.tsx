"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { changeStaffRoleAction } from "@/lib/actions/change-staff-role";
import { setStaffActiveAction } from "@/lib/actions/set-staff-active";
import { CELL, TableCard } from "@/components/ui/table-card";
import { useConfirmedMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import type { StaffRole } from "@/lib/auth/roles";

/** One staff account as the table shows it (a plain object; dates already in words). */
export interface StaffMemberView {
  id: string;
  name: string;
  email: string;
  role: StaffRole;
  roleLabel: string;
  active: boolean;
  /** e.g. "3 Dec 2026, 14:05", or null when never */
  lastSignIn: string | null;
  isSelf: boolean;
}

export interface RoleOption {
  value: StaffRole;
  label: string;
}

type Pending =
  | { kind: "role"; member: StaffMemberView; role: StaffRole }
  | { kind: "active"; member: StaffMemberView; active: boolean };

const pill = "inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap";

function StatusBadge({ active }: { active: boolean }) {
  return active ? (
    <span className={`${pill} bg-pass-soft text-pass`}>Active</span>
  ) : (
    <span className={`${pill} bg-paper-sunk text-ink-muted`}>Deactivated</span>
  );
}

/** The staff list with its row actions: change role, deactivate, reactivate (each confirmed). */
export function StaffTable({ members, roles }: { members: StaffMemberView[]; roles: RoleOption[] }) {
  const router = useRouter();
  const [notice, setNotice] = useState<string | null>(null);
  const change = useConfirmedMutation(
    (p: Pending) =>
      p.kind === "role"
        ? changeStaffRoleAction({ userId: p.member.id, role: p.role })
        : setStaffActiveAction({ userId: p.member.id, active: p.active }),
    (p) => {
      const roleLabel = roles.find((r) => p.kind === "role" && r.value === p.role)?.label;
      setNotice(
        p.kind === "role"
          ? `${p.member.name} is now ${roleLabel ?? p.role}.`
          : p.active
            ? `${p.member.name} can sign in again.`
            : `${p.member.name} is deactivated and signed out everywhere.`,
      );
      router.refresh();
    },
  );
  const pending = change.choice;
  const open = (next: Pending) => {
    setNotice(null);
    change.ask(next);
  };

  const actions = (m: StaffMemberView) =>
    m.isSelf ? (
      <span className="text-xs text-ink-muted">Your own account</span>
    ) : (
      <div className="flex flex-wrap justify-end gap-2 md:flex-nowrap">
        {m.active && (
          <RolePicker member={m} roles={roles} onPick={(role) => open({ kind: "role", member: m, role })} />
        )}
        <button
          type="button"
          className="btn-quiet px-3 py-1.5 text-xs"
          aria-label={`${m.active ? "Deactivate" : "Reactivate"} ${m.name}`}
          onClick={() => open({ kind: "active", member: m, active: !m.active })}
        >
          {m.active ? "Deactivate" : "Reactivate"}
        </button>
      </div>
    );

  return (
    <>
      {notice && (
        <div className="mb-3">
          <Alert tone="success">{notice}</Alert>
        </div>
      )}
      {/* Phones: one card per person. */}
      <ul className="space-y-3 md:hidden" aria-label="Staff accounts">
        {members.map((m) => (
          <li key={m.id} className="card p-4">
            <div className="flex items-start justify-between gap-2">
              <div className="min-w-0">
                <p className="font-medium">
                  {m.name} {m.isSelf && <span className="text-xs text-ink-muted">(you)</span>}
                </p>
                <p className="truncate text-sm text-ink-muted">{m.email}</p>
              </div>
              <StatusBadge active={m.active} />
            </div>
            <dl className="mt-2 grid grid-cols-2 gap-x-3 text-sm">
              <dt className="text-ink-muted">Role</dt>
              <dd>{m.roleLabel}</dd>
              <dt className="text-ink-muted">Last sign-in</dt>
              <dd>{m.lastSignIn ?? "Never"}</dd>
            </dl>
            <div className="mt-3">{actions(m)}</div>
          </li>
        ))}
      </ul>
      <div className="hidden md:block">
        <TableCard
          caption="Staff accounts"
          headings={[
            "Name",
            "E-mail",
            "Role",
            "Status",
            "Last sign-in",
            { label: "Actions", align: "right", srOnly: true },
          ]}
        >
          {members.map((m) => (
            <tr key={m.id} className={m.active ? undefined : "text-ink-muted"}>
              <td className={`${CELL} font-medium whitespace-nowrap`}>
                {m.name} {m.isSelf && <span className="text-xs font-normal text-ink-muted">(you)</span>}
              </td>
              <td className={CELL}>{m.email}</td>
              <td className={CELL}>{m.roleLabel}</td>
              <td className={CELL}>
                <StatusBadge active={m.active} />
              </td>
              <td className={`${CELL} whitespace-nowrap`}>{m.lastSignIn ?? "Never"}</td>
              <td className={`${CELL} text-right`}>{actions(m)}</td>
            </tr>
          ))}
        </TableCard>
      </div>
      <ConfirmDialog
        {...change.dialog}
        tone={pending?.kind === "active" && !pending.active ? "danger" : "primary"}
        title={
          !pending
            ? ""
            : pending.kind === "role"
              ? `Change ${pending.member.name}'s role?`
              : pending.active
                ? `Reactivate ${pending.member.name}?`
                : `Deactivate ${pending.member.name}?`
        }
        confirmLabel={
          !pending
            ? ""
            : pending.kind === "role"
              ? "Change role"
              : pending.active
                ? "Reactivate"
                : "Deactivate"
        }
      >
        {pending?.kind === "role" && (
          <p>
            From <strong>{pending.member.roleLabel}</strong> to{" "}
            <strong>{roles.find((r) => r.value === pending.role)?.label}</strong>. It takes effect on their
            next page; the change is recorded in the audit log.
          </p>
        )}
        {pending?.kind === "active" && !pending.active && (
          <p>
            {pending.member.name} is signed out on every device at once and cannot sign in until an owner
            reactivates the account. Their records stay.
          </p>
        )}
        {pending?.kind === "active" && pending.active && (
          <p>
            {pending.member.name} can sign in again with their old password, as {pending.member.roleLabel}.
          </p>
        )}
      </ConfirmDialog>
    </>
  );
}

/** A role select with its own button, so choosing with the keyboard never fires a change by itself. */
function RolePicker({
  member,
  roles,
  onPick,
}: {
  member: StaffMemberView;
  roles: RoleOption[];
  onPick: (role: StaffRole) => void;
}) {
  const [role, setRole] = useState<StaffRole>(member.role);
  const id = `role-${member.id}`;
  return (
    <span className="inline-flex items-center gap-1">
      <label htmlFor={id} className="sr-only">
        Role for {member.name}
      </label>
      <select
        id={id}
        className="rounded-md border border-line-strong bg-white px-2 py-1 text-xs"
        value={role}
        onChange={(e) => setRole(e.target.value as StaffRole)}
      >
        {roles.map((r) => (
          <option key={r.value} value={r.value}>
            {r.label}
          </option>
        ))}
      </select>
      <button
        type="button"
        className="btn-quiet px-3 py-1.5 text-xs"
        disabled={role === member.role}
        aria-label={`Change ${member.name}'s role`}
        onClick={() => onPick(role)}
      >
        Change
      </button>
    </span>
  );
}
