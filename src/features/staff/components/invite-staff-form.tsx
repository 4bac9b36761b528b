import { useRef, useState, type FormEvent } from "react";
import { INVITATION_LIFETIME_DAYS, inviteStaffInputSchema, type Invitation, type InviteStaffInput } from "@contracts/invitations";
import { fieldErrorsFromIssues, type FieldErrors } from "@contracts/errors";
import { STAFF_ROLE_LABELS, STAFF_ROLES, type StaffRole } from "@contracts/staff-roles";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { PlusIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { useFocusFirstError } from "@/hooks/use-focus-first-error";
import { errorMessage, isApiError } from "@/lib/api-client";
import { useDepartments } from "../api/get-departments";
import { useInviteStaff } from "../api/invite-staff";

interface Values {
  displayName: string;
  email: string;
  role: StaffRole;
  departmentId: string;
}
const EMPTY: Values = { displayName: "", email: "", role: "teacher", departmentId: "" };
const FIELDS = ["displayName", "email", "role", "departmentId"] as const;

/**
 * Invite a colleague by e-mail: name, address, role and department. The message carries a
 * sign-in link; once they sign in with that address they are on the staff list.
 */
export function InviteStaffForm() {
  const [values, setValues] = useState<Values>(EMPTY);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<Invitation | null>(null);
  const [savedNotSent, setSavedNotSent] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const focusFirstError = useFocusFirstError(formRef);
  const departments = useDepartments();
  const invite = useInviteStaff();

  const set = <K extends keyof Values>(key: K, value: Values[K]) => {
    setValues((v) => ({ ...v, [key]: value }));
    if (errors[key]) setErrors(({ [key]: _gone, ...rest }) => rest);
    setSent(null);
    setSavedNotSent(null);
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (invite.isPending) return;
    const input: InviteStaffInput = { ...values, departmentId: values.departmentId || null };
    const checked = inviteStaffInputSchema.safeParse(input);
    setSent(null);
    setSavedNotSent(null);
    if (!checked.success) {
      setErrors(fieldErrorsFromIssues(checked.error.issues));
      setFormError(null);
      focusFirstError();
      return;
    }
    setErrors({});
    setFormError(null);
    invite.mutate(input, {
      onSuccess: (invitation) => {
        setSent(invitation);
        setValues(EMPTY);
      },
      onError: (error) => {
        if (isApiError(error) && error.code === "mail_not_sent") {
          setSavedNotSent(error.message);
          setValues(EMPTY);
          return;
        }
        const fields = isApiError(error) ? error.fields : {};
        setErrors(fields);
        const placed = FIELDS.some((key) => fields[key]?.length);
        setFormError(placed ? null : errorMessage(error));
        focusFirstError();
      },
    });
  };

  const needsDepartment = values.role !== "admin";
  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-label="Invite a member of staff">
      <div className="grid gap-4 md:grid-cols-2">
        <TextField
          label="Name"
          hint="As colleagues know them, e.g. “Sam Reed”."
          value={values.displayName}
          onChange={(e) => set("displayName", e.target.value)}
          error={errors.displayName?.[0]}
          autoComplete="off"
        />
        <TextField
          label="School e-mail address"
          hint="They must sign in with this address."
          type="email"
          inputMode="email"
          value={values.email}
          onChange={(e) => set("email", e.target.value)}
          error={errors.email?.[0]}
          autoComplete="off"
          spellCheck={false}
        />
        <SelectField label="Role" value={values.role} onChange={(e) => set("role", e.target.value as StaffRole)} error={errors.role?.[0]}>
          {STAFF_ROLES.map((role) => (
            <option key={role} value={role}>
              {STAFF_ROLE_LABELS[role]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Department"
          hint={needsDepartment ? "Teachers and heads of department teach in a department." : "Optional for a school admin."}
          value={values.departmentId}
          onChange={(e) => set("departmentId", e.target.value)}
          error={errors.departmentId?.[0] ?? (departments.isError ? "Could not load the departments: reload the page." : undefined)}
          disabled={departments.isPending}
        >
          <option value="">{departments.isPending ? "Loading…" : needsDepartment ? "Choose a department" : "No department"}</option>
          {departments.data?.map((d) => (
            <option key={d.id} value={d.id}>
              {d.name}
            </option>
          ))}
        </SelectField>
      </div>
      {formError ? <FormErrorNotice className="mt-5">{formError}</FormErrorNotice> : null}
      <div className="mt-5 flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" icon={<PlusIcon />} busy={invite.isPending}>
          Send invitation
        </Button>
      </div>
      <div aria-live="polite">
        {sent ? (
          <Notice tone="ok" className="mt-4">
            <p>
              Invitation sent to <strong className="break-all">{sent.email}</strong>. The link works once, for{" "}
              {INVITATION_LIFETIME_DAYS} days.
            </p>
          </Notice>
        ) : null}
        {savedNotSent ? (
          <Notice tone="warn" className="mt-4" title="Saved, but not sent">
            <p>{savedNotSent}</p>
          </Notice>
        ) : null}
      </div>
    </form>
  );
}
