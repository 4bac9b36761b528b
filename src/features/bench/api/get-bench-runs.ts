import { queryOptions, useQuery } from "@tanstack/react-query";
import type { BenchRun } from "@contracts/bench";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

export const getBenchRuns = (classId: string, signal?: AbortSignal) =>
  apiRequest<BenchRun[]>(`/api/classes/${encodeURIComponent(classId)}/bench-runs`, { signal });

export const benchRunsQueryOptions = (classId: string) =>
  queryOptions({ queryKey: benchKeys.runs(classId), queryFn: ({ signal }) => getBenchRuns(classId, signal) });

export const useBenchRuns = (classId: string) => useQuery(benchRunsQueryOptions(classId));
