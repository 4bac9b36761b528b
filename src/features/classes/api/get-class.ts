import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ClassSummary } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

/** One class; `access` says whether it is the teacher's own or seen read-only by the head of department. */
export const getClass = (classId: string, signal?: AbortSignal) =>
  apiRequest<ClassSummary>(`/api/classes/${encodeURIComponent(classId)}`, { signal });

export const classQueryOptions = (classId: string) =>
  queryOptions({
    queryKey: classKeys.detail(classId),
    queryFn: ({ signal }) => getClass(classId, signal),
  });

export const useClass = (classId: string) => useQuery(classQueryOptions(classId));
