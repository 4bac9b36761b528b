import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SchoolClass } from "@contracts/retention";
import { apiRequest } from "@/lib/api-client";
import { pupilDataKeys } from "./pupil-data-keys";

/** Every class of the school with its roster count (school admins only; no pupil names). */
export const getSchoolClasses = (signal?: AbortSignal) => apiRequest<SchoolClass[]>("/api/school/classes", { signal });

export const schoolClassesQueryOptions = () =>
  queryOptions({
    queryKey: pupilDataKeys.schoolClasses(),
    queryFn: ({ signal }) => getSchoolClasses(signal),
  });

export const useSchoolClasses = () => useQuery(schoolClassesQueryOptions());
