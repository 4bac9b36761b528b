import { describe, expect, it } from "vitest";
import { ApiError, NETWORK_ERROR_MESSAGE, apiRequest, buildUrl, errorFromResponse, errorMessage, shouldRetry } from "./api-client";

const jsonResponse = (status: number, body: unknown) =>
  new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { "Content-Type": "application/json" },
  });

describe("errorFromResponse", () => {
  it("keeps the server's code, message and field errors", () => {
    const error = errorFromResponse(400, {
      error: { code: "validation_failed", message: "Some of the details need correcting.", fields: { "names.3": ["This name is blank."] } },
    });
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(400);
    expect(error.code).toBe("validation_failed");
    expect(error.message).toBe("Some of the details need correcting.");
    expect(error.fieldMessage("names.3")).toBe("This name is blank.");
    expect(error.fieldMessage("name")).toBeUndefined();
  });

  it("falls back to a plain message by status when the body is not ours", () => {
    expect(errorFromResponse(502, "<html>Bad gateway</html>")).toMatchObject({ code: "internal_error", status: 502 });
    expect(errorFromResponse(401, undefined)).toMatchObject({ code: "unauthenticated", message: "Sign in to continue." });
    expect(errorFromResponse(418, { nothing: true })).toMatchObject({ code: "bad_response" });
  });

  it("does not trust an unknown code or malformed fields", () => {
    const unknown = errorFromResponse(409, { error: { code: "made_up", message: "Hello" } });
    expect(unknown.code).toBe("bad_response");
    const badFields = errorFromResponse(400, { error: { code: "validation_failed", message: "Fix it.", fields: { name: "not a list" } } });
    expect(badFields.code).toBe("validation_failed");
    expect(badFields.fields).toEqual({});
  });
});

describe("apiRequest", () => {
  it("sends JSON with the session cookie and returns the parsed body", async () => {
    let seen: { url: string; init: RequestInit | undefined } | undefined;
    const fakeFetch: typeof fetch = async (input, init) => {
      seen = { url: String(input), init };
      return jsonResponse(201, { id: "c1" });
    };
    const result = await apiRequest<{ id: string }>("/api/classes", { method: "POST", body: { name: "10A" } }, fakeFetch);
    expect(result).toEqual({ id: "c1" });
    expect(seen?.url).toBe("/api/classes");
    expect(seen?.init?.credentials).toBe("same-origin");
    expect(seen?.init?.body).toBe(JSON.stringify({ name: "10A" }));
    expect((seen?.init?.headers as Record<string, string>)["Content-Type"]).toBe("application/json");
  });

  it("resolves 204 with undefined", async () => {
    const fakeFetch: typeof fetch = async () => new Response(null, { status: 204 });
    await expect(apiRequest("/auth/sign-out", { method: "POST" }, fakeFetch)).resolves.toBeUndefined();
  });

  it("rejects with the server's error", async () => {
    const fakeFetch: typeof fetch = async () =>
      jsonResponse(409, {
        error: { code: "class_name_taken", message: "You already have a current class with that name.", fields: { name: ["Taken."] } },
      });
    const error = await apiRequest("/api/classes", { method: "POST", body: {} }, fakeFetch).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).code).toBe("class_name_taken");
    expect((error as ApiError).fields).toEqual({ name: ["Taken."] });
  });

  it("turns a failed connection into a clear network error", async () => {
    const fakeFetch: typeof fetch = async () => {
      throw new TypeError("Failed to fetch");
    };
    const error = await apiRequest("/api/session", {}, fakeFetch).catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 0, code: "network_error", message: NETWORK_ERROR_MESSAGE });
  });

  it("passes cancellation through untouched", async () => {
    const fakeFetch: typeof fetch = async () => {
      throw new DOMException("The operation was aborted.", "AbortError");
    };
    const error = await apiRequest("/api/session", {}, fakeFetch).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DOMException);
    expect((error as DOMException).name).toBe("AbortError");
  });

  it("refuses a successful answer that is not JSON", async () => {
    const fakeFetch: typeof fetch = async () => new Response("<!doctype html>", { status: 200 });
    await expect(apiRequest("/api/classes", {}, fakeFetch)).rejects.toMatchObject({ code: "bad_response" });
  });
});

describe("buildUrl", () => {
  it("adds only defined query values", () => {
    expect(buildUrl("/api/classes", { archived: "only", other: undefined })).toBe("/api/classes?archived=only");
    expect(buildUrl("/api/classes")).toBe("/api/classes");
  });
});

describe("shouldRetry", () => {
  it("never retries a 4xx answer", () => {
    expect(shouldRetry(0, new ApiError(404, "not_found", "Gone"))).toBe(false);
    expect(shouldRetry(0, new ApiError(401, "unauthenticated", "Sign in"))).toBe(false);
  });
  it("retries network trouble and server errors a limited number of times", () => {
    const offline = new ApiError(0, "network_error", NETWORK_ERROR_MESSAGE);
    expect(shouldRetry(0, offline)).toBe(true);
    expect(shouldRetry(1, new ApiError(503, "internal_error", "Down"))).toBe(true);
    expect(shouldRetry(2, offline)).toBe(false);
  });
});

describe("errorMessage", () => {
  it("shows API messages and hides anything else", () => {
    expect(errorMessage(new ApiError(403, "forbidden", "Only the class's own teacher can change it."))).toBe(
      "Only the class's own teacher can change it.",
    );
    expect(errorMessage(new Error("TypeError: x is undefined at foo.ts:12"))).not.toContain("foo.ts");
  });
});
