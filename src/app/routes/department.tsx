import { useSearchParams } from "react-router";
import { ChoiceBar } from "@/components/ui/choice-bar";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { DepartmentClasses } from "@/features/department/components/department-classes";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { ARCHIVED_FILTER_OPTIONS, archivedFilterFromParam, paramFromArchivedFilter } from "@/lib/archived-filter";
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
  const [params, setParams] = useSearchParams();
  const filter = archivedFilterFromParam(params.get("show"));

  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title={me.department ? `${me.department.name} department` : "Department"}
        description="Every class in the department, grouped by teacher. You can open each class and its roster to look; only its own teacher can change it."
      />
      {me.department ? (
        <>
          <div className="mb-5">
            <ChoiceBar
              legend="Which classes to show"
              visibleLegend="Show"
              options={ARCHIVED_FILTER_OPTIONS}
              value={filter}
              onChange={(next) => {
                const param = paramFromArchivedFilter(next);
                setParams(param ? { show: param } : {}, { replace: true });
              }}
            />
          </div>
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
