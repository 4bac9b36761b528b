import { useEffect, useId, useRef, useState, type FormEvent } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import type { Department } from "@contracts/invitations";
import type { StaffMember, UpdateStaffInput } from "@contracts/staff";
import type { StaffRole } from "@contracts/staff-roles";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { CONTROL_CLASSES, FieldError } from "@/components/ui/field";
import { CheckCircleIcon, RemoveIcon, WarnIcon } from "@/components/ui/icons";
import { isApiError, errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { STAFF_ROLE_LABELS } from "@contracts/staff-roles";
import { useDepartments } from "../api/get-departments";
import { useRemoveStaff } from "../api/remove-staff";
import { useUpdateStaff } from "../api/update-staff";

const ROLE_ORDER: readonly StaffRole[] = ["teacher", "head_of_department", "admin"];

const formatSignIn = (iso: string | null) =>
  iso ? new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }) : "Never";

/**
 * The school's staff with a department and a role choice per person. Each choice saves on its own
 * and says how it went right beside it. On a phone the table reflows into one card per person.
 */
export function StaffTable({ staff, viewerId }: { staff: readonly StaffMember[]; viewerId: string }) {
  const departments = useDepartments();
  return (
    <table className="block w-full text-left md:table">
      <caption className="sr-only">Staff, their departments and roles</caption>
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
          <StaffRow key={member.id} member={member} isViewer={member.id === viewerId} departments={departments} />
        ))}
      </tbody>
    </table>
  );
}

const CELL = "block px-4 py-1.5 md:table-cell md:px-3 md:py-3 md:align-top md:first:pl-0 md:last:pr-0";
const CELL_LABEL = "block text-sm font-bold text-ink-muted md:hidden";
const NO_DEPARTMENT = "";
const ROLE_OPTIONS = ROLE_ORDER.map((value) => ({ value, label: STAFF_ROLE_LABELS[value] }));

function StaffRow({
  member,
  isViewer,
  departments,
}: {
  member: StaffMember;
  isViewer: boolean;
  departments: UseQueryResult<Department[]>;
}) {
  const current = member.department;
  // Until the list arrives, the person's own department is the only one to show.
  const departmentOptions = [
    ...(departments.data ?? (current ? [current] : [])).map((d) => ({ value: d.id, label: d.name })),
    { value: NO_DEPARTMENT, label: "None" },
  ];

  return (
    <tr className="block rounded-card border border-line bg-surface py-2 shadow-card md:table-row md:rounded-none md:border-x-0 md:border-b-0 md:py-0 md:shadow-none">
      <td className={CELL}>
        <span className="block font-bold">
          {member.displayName}
          {isViewer ? <span className="font-normal text-ink-muted"> (you)</span> : null}
        </span>
        <span className="block text-sm text-ink-muted [overflow-wrap:anywhere]">{member.email}</span>
      </td>
      <td className={cx(CELL, "md:min-w-[16rem]")}>
        <ChoiceForm
          member={member}
          field="departmentId"
          label="Department"
          saved={current?.id ?? NO_DEPARTMENT}
          options={departmentOptions}
          unavailable={
            departments.isPending ? "Loading the departments…" : departments.isError ? "Could not load the departments: reload the page to try again." : null
          }
          toInput={(value) => ({ departmentId: value || null })}
          unsavedNote={(value) =>
            `Not saved yet. ${value ? "" : "Without a department they cannot create classes. "}Classes they already have stay in the department they were made in.`
          }
          savedText={(saved) =>
            saved.department
              ? `Saved: ${saved.displayName} is now in ${saved.department.name}. Their classes stay where they were.`
              : `Saved: ${saved.displayName} is in no department now. Their classes stay where they were.`
          }
        />
      </td>
      <td className={CELL}>
        <span className={CELL_LABEL}>Last signed in</span>
        <span className="md:whitespace-nowrap">{formatSignIn(member.lastSignInAt)}</span>
      </td>
      <td className={cx(CELL, "md:min-w-[22rem]")}>
        <ChoiceForm
          member={member}
          field="role"
          label="Role"
          saved={member.role}
          options={ROLE_OPTIONS}
          unavailable={null}
          toInput={(value) => ({ role: value as StaffRole })}
          unsavedNote={(value) =>
            isViewer && value !== "admin"
              ? "Not saved yet. This is your own role: once saved, you can no longer manage staff."
              : "Not saved yet."
          }
          savedText={(saved) => `Saved: ${saved.displayName}’s role is now ${STAFF_ROLE_LABELS[saved.role]}.`}
        />
        {isViewer ? null : <RemoveAccess member={member} />}
      </td>
    </tr>
  );
}

interface ChoiceFormProps {
  member: StaffMember;
  /** The request field, also the key of the server's message for it. */
  field: "role" | "departmentId";
  label: string;
  saved: string;
  options: readonly { value: string; label: string }[];
  /** Why the choice cannot be used yet (loading, failed), or null. */
  unavailable: string | null;
  toInput: (value: string) => UpdateStaffInput;
  unsavedNote: (value: string) => string;
  savedText: (saved: StaffMember) => string;
}

/** One choice about a person (role or department): pick, save, and read the outcome beside it. */
function ChoiceForm({ member, field, label, saved, options, unavailable, toInput, unsavedNote, savedText }: ChoiceFormProps) {
  // null until the admin picks something, so a change saved elsewhere shows through.
  const [draft, setDraft] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const update = useUpdateStaff();
  const selectRef = useRef<HTMLSelectElement>(null);
  const id = useId();
  const value = draft ?? saved;
  const changed = value !== saved;
  const what = label.toLowerCase();

  // Saving removes the save button; if focus went with it, put it back on the choice.
  useEffect(() => {
    const lost = document.activeElement === null || document.activeElement === document.body;
    if (message?.tone === "ok" && lost) selectRef.current?.focus();
  }, [message]);

  const save = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (update.isPending || !changed) return;
    setMessage(null);
    update.mutate(
      { staffId: member.id, ...toInput(value) },
      {
        onSuccess: (savedMember) => {
          setDraft(null);
          setMessage({ tone: "ok", text: savedText(savedMember) });
        },
        onError: (error) => {
          const text = (isApiError(error) && error.fieldMessage(field)) || errorMessage(error);
          setMessage({ tone: "danger", text });
        },
      },
    );
  };

  return (
    <form onSubmit={save} noValidate className="grid gap-2">
      <label htmlFor={`${id}-${field}`} className={CELL_LABEL}>
        {label}
      </label>
      <span id={`${id}-name`} className="sr-only">
        {label} for {member.displayName}
      </span>
      <div className="flex flex-wrap items-start gap-2">
        <select
          ref={selectRef}
          id={`${id}-${field}`}
          aria-labelledby={`${id}-name`}
          value={value}
          disabled={update.isPending || unavailable !== null}
          onChange={(event) => {
            setDraft(event.target.value);
            setMessage(null);
          }}
          aria-invalid={message?.tone === "danger" || undefined}
          aria-describedby={message ? `${id}-message` : unavailable ? `${id}-unavailable` : undefined}
          className={cx(CONTROL_CLASSES, "w-auto min-w-44 flex-1 cursor-pointer disabled:cursor-not-allowed disabled:opacity-60")}
        >
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
        {changed ? (
          <Button type="submit" variant="primary" busy={update.isPending} aria-label={`Save ${what} for ${member.displayName}`}>
            Save {what}
          </Button>
        ) : null}
      </div>
      {unavailable ? (
        <p id={`${id}-unavailable`} className="text-sm text-ink-muted">
          {unavailable}
        </p>
      ) : null}
      {changed && !message && !update.isPending ? (
        <p className="flex items-start gap-1.5 text-sm font-bold text-warn">
          <WarnIcon className="size-4 mt-0.5" />
          {unsavedNote(value)}
        </p>
      ) : null}
      <div role="status" aria-live="polite">
        {update.isPending ? <p className="text-sm text-ink-muted">Saving…</p> : null}
        {message?.tone === "ok" ? (
          <p id={`${id}-message`} className="flex items-start gap-1.5 font-bold text-ok">
            <CheckCircleIcon className="mt-0.5 size-5" />
            {message.text}
          </p>
        ) : null}
      </div>
      <div role="alert">{message?.tone === "danger" ? <FieldError id={`${id}-message`}>{message.text}</FieldError> : null}</div>
    </form>
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
