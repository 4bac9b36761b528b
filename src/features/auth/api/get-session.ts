import { queryOptions, useQuery } from "@tanstack/react-query";
import type { SessionInfo } from "@contracts/session";
import { apiRequest } from "@/lib/api-client";
import { authKeys } from "./auth-keys";

/** Who is signed in in this browser (always 200; `user` is null when signed out). */
export const getSession = (signal?: AbortSignal) => apiRequest<SessionInfo>("/api/session", { signal });

export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.session(),
    queryFn: ({ signal }) => getSession(signal),
    // Role changes arrive over the socket (`session:changed`), so there is no need to poll.
    staleTime: 5 * 60_000,
  });

export const useSession = () => useQuery(sessionQueryOptions());
