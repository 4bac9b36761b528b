import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ArchivedFilter, ClassSummary } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { departmentKeys } from "./department-keys";

/** Every class in the head's department, read-only. */
export const getDepartmentClasses = (archived: ArchivedFilter, signal?: AbortSignal) =>
  apiRequest<ClassSummary[]>("/api/department/classes", { query: { archived }, signal });

export const departmentClassesQueryOptions = (archived: ArchivedFilter) =>
  queryOptions({
    queryKey: departmentKeys.classList({ archived }),
    queryFn: ({ signal }) => getDepartmentClasses(archived, signal),
    // Teachers change their classes elsewhere; always check again when the page opens.
    staleTime: 0,
  });

export const useDepartmentClasses = (archived: ArchivedFilter) => useQuery(departmentClassesQueryOptions(archived));
