import { queryOptions, useQuery } from "@tanstack/react-query";
import type { Invitation } from "@contracts/invitations";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Invitations nobody has used or cancelled yet, newest first (school admins only). */
export const getInvitations = (signal?: AbortSignal) => apiRequest<Invitation[]>("/api/invitations", { signal });

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: staffKeys.invitations(),
    queryFn: ({ signal }) => getInvitations(signal),
    // Invitations are accepted elsewhere (by the invited person): check again whenever the page is shown.
    staleTime: 0,
  });

export const useInvitations = () => useQuery(invitationsQueryOptions());
