import type { ArchivedFilter } from "@contracts/classes";

/**
 * Query keys for the teacher's classes, from general to specific, so a mutation can refresh
 * everything below a prefix: `classKeys.lists()` covers every filtered list, `classKeys.detail(id)`
 * covers the class and its roster.
 */
export const classKeys = {
  all: ["classes"] as const,
  lists: () => [...classKeys.all, "list"] as const,
  list: (filters: { archived: ArchivedFilter }) => [...classKeys.lists(), filters] as const,
  details: () => [...classKeys.all, "detail"] as const,
  detail: (classId: string) => [...classKeys.details(), classId] as const,
  roster: (classId: string) => [...classKeys.detail(classId), "roster"] as const,
};
