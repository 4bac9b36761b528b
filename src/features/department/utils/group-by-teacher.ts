import type { ClassSummary } from "@contracts/classes";

export interface TeacherGroup {
  teacher: ClassSummary["teacher"];
  classes: ClassSummary[];
}

/**
 * Department classes grouped by teacher: the viewer's own group first, then teachers by name;
 * classes by name within a group (numbers in names sort as numbers: "9B" before "10A").
 */
export function groupByTeacher(classes: readonly ClassSummary[], viewerId?: string): TeacherGroup[] {
  const groups = new Map<string, TeacherGroup>();
  for (const item of classes) {
    const group = groups.get(item.teacher.id) ?? { teacher: item.teacher, classes: [] };
    group.classes.push(item);
    groups.set(item.teacher.id, group);
  }
  const collator = new Intl.Collator("en-GB", { numeric: true, sensitivity: "base" });
  for (const group of groups.values()) group.classes.sort((a, b) => collator.compare(a.name, b.name));
  return [...groups.values()].sort((a, b) => {
    if (a.teacher.id === viewerId) return -1;
    if (b.teacher.id === viewerId) return 1;
    return collator.compare(a.teacher.displayName, b.teacher.displayName);
  });
}
