import { useQueryClient } from "@tanstack/react-query";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { PeopleIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { authKeys } from "@/features/auth/api/auth-keys";
import { useStaff } from "@/features/staff/api/get-staff";
import { InvitationList } from "@/features/staff/components/invitation-list";
import { InviteStaffForm } from "@/features/staff/components/invite-staff-form";
import { TimeZoneForm } from "@/features/school/components/time-zone-form";
import { StaffTable } from "@/features/staff/components/staff-table";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { useMe } from "../use-me";

const ROLE_NOTES = [
  { role: "Teacher", does: "Creates classes and keeps their rosters." },
  { role: "Head of department", does: "Everything a teacher does, and looks at every class in their department without changing it." },
  { role: "School admin", does: "Invites staff, manages roles and access, and looks after pupil data. Does not teach classes in Linkleap." },
] as const;

export function Component() {
  useDocumentTitle("Staff");
  return (
    <RequireRole roles={["admin"]} forWhom="school admins">
      <StaffPage />
    </RequireRole>
  );
}

function StaffPage() {
  const me = useMe();
  const queryClient = useQueryClient();
  const staff = useStaff();
  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title="Staff"
        description="Who can sign in to Linkleap, and what each person can do. Invite colleagues, change a department or role and save it on that row, or remove someone’s access."
      />
      <div className="grid gap-6">
        <Section title="Invite a member of staff" description="They get an e-mail with a link; signing in with that address puts them on the list below.">
          <InviteStaffForm />
        </Section>
        <Section title="Invitations waiting">
          <InvitationList />
        </Section>
        <Section title="Staff, departments and roles">
          {staff.isPending ? (
            <SkeletonList rows={4} label="Loading the staff list…" />
          ) : staff.isError ? (
            <ErrorState title="Could not load the staff list" error={staff.error} onRetry={() => void staff.refetch()} retrying={staff.isFetching} />
          ) : staff.data.length === 0 ? (
            <EmptyState icon={<PeopleIcon />} title="No staff yet" />
          ) : (
            <StaffTable staff={staff.data} viewerId={me.id} />
          )}
        </Section>
        <Section
          title="School time zone"
          description="Heads of department see lessons counted by day and week in this zone, in the department overview and the weekly digest."
        >
          <TimeZoneForm current={me.school.timeZone} onSaved={() => queryClient.invalidateQueries({ queryKey: authKeys.session() })} />
        </Section>
        <Section title="What the roles mean">
          <dl className="grid gap-4 md:grid-cols-3">
            {ROLE_NOTES.map((note) => (
              <div key={note.role}>
                <dt className="font-bold">{note.role}</dt>
                <dd className="text-ink-muted">{note.does}</dd>
              </div>
            ))}
          </dl>
        </Section>
      </div>
    </>
  );
}
