import type { ArchivedFilter } from "@contracts/classes";

/** Query keys for the head of department's view. */
export const departmentKeys = {
  all: ["department"] as const,
  classLists: () => [...departmentKeys.all, "classes"] as const,
  classList: (filters: { archived: ArchivedFilter }) => [...departmentKeys.classLists(), filters] as const,
  overviews: () => [...departmentKeys.all, "overview"] as const,
  overview: (range: { from: string; to: string }) => [...departmentKeys.overviews(), range] as const,
};
