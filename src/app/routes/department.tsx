import { ArchivedFilterBar } from "@/components/ui/archived-filter-bar";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { DepartmentClasses } from "@/features/department/components/department-classes";
import { DepartmentOverview } from "@/features/department/components/department-overview";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { useArchivedFilterParam } from "@/hooks/use-archived-filter-param";
import { RequireRole } from "../layouts/require-role";
import { useMe } from "../use-me";

export function Component() {
  useDocumentTitle("Department");
  return (
    <RequireRole roles={["head_of_department"]} forWhom="heads of department">
      <DepartmentPage />
    </RequireRole>
  );
}

function DepartmentPage() {
  const me = useMe();
  const [filter, setFilter] = useArchivedFilterParam();

  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title={me.department ? `${me.department.name} department` : "Department"}
        description="How the department uses live lessons, and every class grouped by teacher. You can open each class and its roster to look; only its own teacher can change it."
      />
      {me.department ? (
        <>
          <DepartmentOverview timeZone={me.school.timeZone} />
          <h2 className="mt-4 text-2xl font-bold">Classes</h2>
          <ArchivedFilterBar value={filter} onChange={setFilter} />
          <DepartmentClasses archived={filter} viewerId={me.id} />
        </>
      ) : (
        <Notice tone="warn" title="You are not attached to a department">
          <p>Ask your school admin to put you in a department; its classes then appear here.</p>
        </Notice>
      )}
    </>
  );
}
