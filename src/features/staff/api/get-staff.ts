import { queryOptions, useQuery } from "@tanstack/react-query";
import type { StaffMember } from "@contracts/staff";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Everyone on the school's staff list (school admins only). */
export const getStaff = (signal?: AbortSignal) => apiRequest<StaffMember[]>("/api/staff", { signal });

export const staffQueryOptions = () =>
  queryOptions({
    queryKey: staffKeys.lists(),
    queryFn: ({ signal }) => getStaff(signal),
    // People join by accepting invitations elsewhere: check again whenever the page is shown.
    staleTime: 0,
  });

export const useStaff = () => useQuery(staffQueryOptions());
