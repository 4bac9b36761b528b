import type { ArchivedFilter } from "@contracts/classes";

/** The class-list filter as words people see, and as a short URL value (`?show=archived`). */
export const ARCHIVED_FILTER_OPTIONS: readonly { value: ArchivedFilter; label: string; param: string }[] = [
  { value: "exclude", label: "Current", param: "current" },
  { value: "only", label: "Archived", param: "archived" },
  { value: "include", label: "All", param: "all" },
];

export function archivedFilterFromParam(param: string | null): ArchivedFilter {
  return ARCHIVED_FILTER_OPTIONS.find((o) => o.param === param)?.value ?? "exclude";
}

export function paramFromArchivedFilter(filter: ArchivedFilter): string | undefined {
  return filter === "exclude" ? undefined : ARCHIVED_FILTER_OPTIONS.find((o) => o.value === filter)?.param;
}
