import { MutationCache, QueryCache, QueryClient, type QueryKey } from "@tanstack/react-query";
import { authKeys } from "@/features/auth/api/auth-keys";
import { isApiError, shouldRetry } from "@/lib/api-client";

/**
 * One QueryClient for the app. A 401 from any call means the session ended without this tab
 * hearing about it (expired cookie, server restart): re-check the session, and the signed-in
 * layout then sends the person to sign in.
 */
export function createQueryClient() {
  const onError = (error: unknown, queryKey?: QueryKey) => {
    if (!isApiError(error) || error.status !== 401) return;
    if (queryKey?.[0] === authKeys.all[0]) return;
    void queryClient.invalidateQueries({ queryKey: authKeys.session() });
  };

  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => onError(error, query.queryKey) }),
    mutationCache: new MutationCache({ onError: (error) => onError(error) }),
    defaultOptions: {
      queries: {
        // No retry for 4xx (the answer will not change); network trouble and 5xx get two more tries.
        retry: (failureCount, error) => shouldRetry(failureCount, error),
        staleTime: 30_000,
      },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
