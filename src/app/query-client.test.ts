import { describe, expect, it } from "vitest";
import { authKeys } from "@/features/auth/api/auth-keys";
import { ApiError, NETWORK_ERROR_MESSAGE } from "@/lib/api-client";
import { createQueryClient } from "./query-client";

const failingWith = (error: ApiError) => {
  let calls = 0;
  return {
    queryFn: () => {
      calls += 1;
      return Promise.reject(error);
    },
    calls: () => calls,
  };
};

describe("the app's QueryClient", () => {
  it("re-checks the session when any call answers 401", async () => {
    const client = createQueryClient();
    client.setQueryData(authKeys.session(), { user: null, notice: null, demo: true });
    const { queryFn } = failingWith(new ApiError(401, "unauthenticated", "Sign in to continue."));
    await client.fetchQuery({ queryKey: ["classes", "list"], queryFn }).catch(() => undefined);
    expect(client.getQueryState(authKeys.session())?.isInvalidated).toBe(true);
  });

  it("leaves the session alone for other errors", async () => {
    const client = createQueryClient();
    client.setQueryData(authKeys.session(), { user: null, notice: null, demo: true });
    const { queryFn } = failingWith(new ApiError(403, "forbidden", "Your role does not allow this."));
    await client.fetchQuery({ queryKey: ["staff", "list"], queryFn }).catch(() => undefined);
    expect(client.getQueryState(authKeys.session())?.isInvalidated).toBe(false);
  });

  it("does not retry a 404, and retries a dropped connection twice", async () => {
    const client = createQueryClient();
    const notFound = failingWith(new ApiError(404, "not_found", "That class was not found."));
    await client.fetchQuery({ queryKey: ["a"], queryFn: notFound.queryFn, retryDelay: 0 }).catch(() => undefined);
    expect(notFound.calls()).toBe(1);

    const offline = failingWith(new ApiError(0, "network_error", NETWORK_ERROR_MESSAGE));
    await client.fetchQuery({ queryKey: ["b"], queryFn: offline.queryFn, retryDelay: 0 }).catch(() => undefined);
    expect(offline.calls()).toBe(3);
  });
});
