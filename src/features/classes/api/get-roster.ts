import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Roster } from "@contracts/roster";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

export const getRoster = (classId: string, signal?: AbortSignal) =>
  apiRequest<Roster>(`/api/classes/${encodeURIComponent(classId)}/roster`, { signal });

export const rosterQueryOptions = (classId: string) =>
  queryOptions({
    queryKey: classKeys.roster(classId),
    queryFn: ({ signal }) => getRoster(classId, signal),
  });

export const useRoster = (classId: string) => useQuery(rosterQueryOptions(classId));
