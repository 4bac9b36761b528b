import { ButtonLink } from "@/components/ui/button";
import { BuildingIcon, ChevronRightIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";

/** For the head of department: the way into the department's classes. */
export function DepartmentShortcut({ departmentName }: { departmentName: string | null }) {
  return (
    <Section title={departmentName ? `${departmentName} department` : "Your department"}>
      <div className="flex items-start gap-3">
        <BuildingIcon className="mt-0.5 size-6 text-accent" />
        <p>Every class in the department, grouped by teacher, to look at without changing anything.</p>
      </div>
      <ButtonLink to="/department" className="mt-4" icon={<ChevronRightIcon />}>
        Department classes
      </ButtonLink>
    </Section>
  );
}
