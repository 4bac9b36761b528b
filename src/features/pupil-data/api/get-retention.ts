import { queryOptions, useQuery } from "@tanstack/react-query";
import type { RetentionSettings } from "@contracts/retention";
import { apiRequest } from "@/lib/api-client";
import { pupilDataKeys } from "./pupil-data-keys";

/** How long the school keeps pupil data, and when the deletion job last ran (any member of staff). */
export const getRetention = (signal?: AbortSignal) => apiRequest<RetentionSettings>("/api/school/retention", { signal });

export const retentionQueryOptions = () =>
  queryOptions({
    queryKey: pupilDataKeys.retention(),
    queryFn: ({ signal }) => getRetention(signal),
  });

export const useRetention = () => useQuery(retentionQueryOptions());
