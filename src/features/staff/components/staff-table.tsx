import { useId, useState, type FormEvent } from "react";
import type { StaffMember } from "@contracts/staff";
import type { StaffRole } from "@contracts/staff-roles";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { CONTROL_CLASSES, FieldError } from "@/components/ui/field";
import { CheckCircleIcon, RemoveIcon, WarnIcon } from "@/components/ui/icons";
import { isApiError, errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { STAFF_ROLE_LABELS } from "@contracts/staff-roles";
import { useRemoveStaff } from "../api/remove-staff";
import { useUpdateStaff } from "../api/update-staff";

const ROLE_ORDER: readonly StaffRole[] = ["teacher", "head_of_department", "admin"];

const formatSignIn = (iso: string | null) =>
  iso ? new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }) : "Never";

/**
 * The school's staff with a role choice per person. Each row saves on its own and says how it
 * went right beside it. On a phone the table reflows into one card per person.
 */
export function StaffTable({ staff, viewerId }: { staff: readonly StaffMember[]; viewerId: string }) {
  return (
    <table className="block w-full text-left md:table">
      <caption className="sr-only">Staff and their roles</caption>
      <thead className="sr-only md:not-sr-only md:table-header-group">
        <tr className="text-sm text-ink-muted">
          <th scope="col" className="py-2 pr-3 font-bold">Name</th>
          <th scope="col" className="px-3 py-2 font-bold">Department</th>
          <th scope="col" className="px-3 py-2 font-bold">Last signed in</th>
          <th scope="col" className="py-2 pl-3 font-bold">Role</th>
        </tr>
      </thead>
      <tbody className="grid gap-3 md:table-row-group">
        {staff.map((member) => (
          <StaffRow key={member.id} member={member} isViewer={member.id === viewerId} />
        ))}
      </tbody>
    </table>
  );
}

const CELL = "block px-4 py-1.5 md:table-cell md:px-3 md:py-3 md:align-top md:first:pl-0 md:last:pr-0";
const CELL_LABEL = "block text-sm font-bold text-ink-muted md:hidden";

function StaffRow({ member, isViewer }: { member: StaffMember; isViewer: boolean }) {
  const [role, setRole] = useState<StaffRole>(member.role);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const update = useUpdateStaff();
  const id = useId();
  const changed = role !== member.role;
  const demotingSelf = isViewer && changed && role !== "admin";

  const save = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (update.isPending || !changed) return;
    setMessage(null);
    update.mutate(
      { staffId: member.id, role },
      {
        onSuccess: (saved) => {
          setRole(saved.role);
          setMessage({ tone: "ok", text: `Saved: ${saved.displayName}’s role is now ${STAFF_ROLE_LABELS[saved.role]}.` });
        },
        onError: (error) => {
          const text = (isApiError(error) && error.fieldMessage("role")) || errorMessage(error);
          setMessage({ tone: "danger", text });
        },
      },
    );
  };

  return (
    <tr className="block rounded-card border border-line bg-surface py-2 shadow-card md:table-row md:rounded-none md:border-x-0 md:border-b-0 md:py-0 md:shadow-none">
      <td className={CELL}>
        <span className="block font-bold">
          {member.displayName}
          {isViewer ? <span className="font-normal text-ink-muted"> (you)</span> : null}
        </span>
        <span className="block text-sm text-ink-muted [overflow-wrap:anywhere]">{member.email}</span>
      </td>
      <td className={CELL}>
        <span className={CELL_LABEL}>Department</span>
        {member.department?.name ?? <span className="text-ink-muted">None</span>}
      </td>
      <td className={CELL}>
        <span className={CELL_LABEL}>Last signed in</span>
        <span className="md:whitespace-nowrap">{formatSignIn(member.lastSignInAt)}</span>
      </td>
      <td className={cx(CELL, "md:min-w-[22rem]")}>
        <form onSubmit={save} noValidate className="grid gap-2">
          <label htmlFor={`${id}-role`} className={CELL_LABEL}>
            Role
          </label>
          <span id={`${id}-name`} className="sr-only">
            Role for {member.displayName}
          </span>
          <div className="flex flex-wrap items-start gap-2">
            <select
              id={`${id}-role`}
              aria-labelledby={`${id}-name`}
              value={role}
              onChange={(event) => {
                setRole(event.target.value as StaffRole);
                setMessage(null);
              }}
              aria-invalid={message?.tone === "danger" || undefined}
              aria-describedby={message ? `${id}-message` : undefined}
              className={cx(CONTROL_CLASSES, "w-auto min-w-52 flex-1 cursor-pointer")}
            >
              {ROLE_ORDER.map((value) => (
                <option key={value} value={value}>
                  {STAFF_ROLE_LABELS[value]}
                </option>
              ))}
            </select>
            {changed ? (
              <Button type="submit" variant="primary" busy={update.isPending} aria-label={`Save role for ${member.displayName}`}>
                Save role
              </Button>
            ) : null}
          </div>
          {changed && !message ? (
            <p className="flex items-start gap-1.5 text-sm font-bold text-warn">
              <WarnIcon className="size-4 mt-0.5" />
              {demotingSelf
                ? "Not saved yet. This is your own role: once saved, you can no longer manage staff."
                : "Not saved yet."}
            </p>
          ) : null}
          <div role="status" aria-live="polite">
            {message?.tone === "ok" ? (
              <p id={`${id}-message`} className="flex items-start gap-1.5 font-bold text-ok">
                <CheckCircleIcon className="mt-0.5 size-5" />
                {message.text}
              </p>
            ) : null}
          </div>
          <div role="alert">{message?.tone === "danger" ? <FieldError id={`${id}-message`}>{message.text}</FieldError> : null}</div>
        </form>
        {isViewer ? null : <RemoveAccess member={member} />}
      </td>
    </tr>
  );
}

/** Removes a person's access after asking; they are signed out everywhere at once. */
function RemoveAccess({ member }: { member: StaffMember }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useRemoveStaff();
  return (
    <>
      <Button
        variant="quiet"
        className="mt-2 -ml-3 text-danger hover:bg-danger-soft"
        icon={<RemoveIcon />}
        aria-label={`Remove access for ${member.displayName}`}
        onClick={() => {
          remove.reset();
          setConfirming(true);
        }}
      >
        Remove access
      </Button>
      <ConfirmDialog
        open={confirming}
        onCancel={() => setConfirming(false)}
        onConfirm={() => {
          if (remove.isPending) return;
          remove.mutate(member.id, { onSuccess: () => setConfirming(false) });
        }}
        busy={remove.isPending}
        tone="danger"
        title={`Remove ${member.displayName}’s access?`}
        confirmLabel="Remove access"
        error={remove.error}
      >
        <p>
          {member.displayName} is signed out on every device straight away and can no longer sign in. Their classes stay with
          the school. To let them back, invite {member.email} again.
        </p>
      </ConfirmDialog>
    </>
  );
}
