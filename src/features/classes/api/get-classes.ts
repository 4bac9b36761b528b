import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ArchivedFilter, ClassSummary } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

/** The signed-in teacher's own classes. */
export const getClasses = (archived: ArchivedFilter, signal?: AbortSignal) =>
  apiRequest<ClassSummary[]>("/api/classes", { query: { archived }, signal });

export const classesQueryOptions = (archived: ArchivedFilter) =>
  queryOptions({
    queryKey: classKeys.list({ archived }),
    queryFn: ({ signal }) => getClasses(archived, signal),
  });

export const useClasses = (archived: ArchivedFilter) => useQuery(classesQueryOptions(archived));
