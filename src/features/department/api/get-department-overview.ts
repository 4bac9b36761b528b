import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { DepartmentOverview } from "@contracts/department-overview";
import { apiRequest, buildUrl } from "@/lib/api-client";
import { departmentKeys } from "./department-keys";

/** Totals of the department's live lessons in a date range (both days included). */
export const getDepartmentOverview = (range: { from: string; to: string }, signal?: AbortSignal) =>
  apiRequest<DepartmentOverview>("/api/department/overview", { query: range, signal });

export const departmentOverviewQueryOptions = (range: { from: string; to: string }) =>
  queryOptions({
    queryKey: departmentKeys.overview(range),
    queryFn: ({ signal }) => getDepartmentOverview(range, signal),
    // Lessons end all day long: check again when the page opens.
    staleTime: 0,
    // A new range keeps the old figures on screen until the new ones arrive.
    placeholderData: keepPreviousData,
  });

export const useDepartmentOverview = (range: { from: string; to: string }) => useQuery(departmentOverviewQueryOptions(range));

/** The same range as CSV, for a download link (the session cookie goes with it). */
export const departmentOverviewCsvUrl = (range: { from: string; to: string }) => buildUrl("/api/department/overview.csv", range);
