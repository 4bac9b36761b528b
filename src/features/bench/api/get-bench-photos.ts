import { queryOptions, useQuery } from "@tanstack/react-query";
import type { BenchPhoto } from "@contracts/bench";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

export const getBenchPhotos = (classId: string, signal?: AbortSignal) =>
  apiRequest<BenchPhoto[]>(`/api/classes/${encodeURIComponent(classId)}/bench-photos`, { signal });

export const benchPhotosQueryOptions = (classId: string) =>
  queryOptions({ queryKey: benchKeys.photos(classId), queryFn: ({ signal }) => getBenchPhotos(classId, signal) });

export const useBenchPhotos = (classId: string) => useQuery(benchPhotosQueryOptions(classId));
