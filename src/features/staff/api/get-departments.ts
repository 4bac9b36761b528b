import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Department } from "@contracts/invitations";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** The school's departments, to invite someone into. */
export const getDepartments = (signal?: AbortSignal) => apiRequest<Department[]>("/api/school/departments", { signal });

export const departmentsQueryOptions = () =>
  queryOptions({
    queryKey: staffKeys.departments(),
    queryFn: ({ signal }) => getDepartments(signal),
    staleTime: 10 * 60_000,
  });

export const useDepartments = () => useQuery(departmentsQueryOptions());
