import { ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ChevronRightIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useRetention } from "@/features/pupil-data/api/get-retention";
import { PurgeStatus, RetentionForm } from "@/features/pupil-data/components/retention-settings";
import { SchoolClassesData } from "@/features/pupil-data/components/school-classes-data";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { useMe } from "../use-me";

export function Component() {
  useDocumentTitle("Pupil data");
  return (
    <RequireRole roles={["admin"]} forWhom="school admins">
      <PupilDataPage />
    </RequireRole>
  );
}

function PupilDataPage() {
  const me = useMe();
  const retention = useRetention();
  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title="Pupil data"
        description="How long Linkleap keeps pupils’ data at your school, when it was last deleted, and deleting a class’s data now."
        actions={
          <ButtonLink to="/privacy" icon={<ChevronRightIcon />}>
            What is stored, and why
          </ButtonLink>
        }
      />
      <div className="grid gap-6 lg:grid-cols-2">
        <Section title="How long to keep it">
          {retention.isPending ? (
            <SkeletonList rows={2} label="Loading the setting…" />
          ) : retention.isError ? (
            <ErrorState title="Could not load the setting" error={retention.error} onRetry={() => void retention.refetch()} retrying={retention.isFetching} />
          ) : (
            <RetentionForm settings={retention.data} />
          )}
        </Section>
        <Section
          title="Nightly deletion"
          description="A job deletes pupil data past its time every night. For now that is the roster names of classes archived for longer than the period above."
        >
          {retention.isPending ? (
            <SkeletonList rows={1} label="Loading…" />
          ) : retention.isError ? null : (
            <PurgeStatus settings={retention.data} />
          )}
        </Section>
      </div>
      <Section
        className="mt-6"
        title="Classes"
        description="Each class with how many roster names it holds. Deleting a class’s pupil data takes effect at once and is recorded in the audit log."
      >
        <SchoolClassesData />
      </Section>
    </>
  );
}
