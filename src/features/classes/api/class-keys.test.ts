import { describe, expect, it } from "vitest";
import { QueryClient } from "@tanstack/react-query";
import { classKeys } from "./class-keys";

describe("classKeys", () => {
  it("nests lists, details and rosters under one prefix", () => {
    expect(classKeys.list({ archived: "only" })).toEqual(["classes", "list", { archived: "only" }]);
    expect(classKeys.roster("c1")).toEqual(["classes", "detail", "c1", "roster"]);
  });

  it("lets a mutation refresh every list, and one class with its roster, by prefix", async () => {
    const client = new QueryClient();
    client.setQueryData(classKeys.list({ archived: "exclude" }), []);
    client.setQueryData(classKeys.list({ archived: "only" }), []);
    client.setQueryData(classKeys.detail("c1"), { id: "c1" });
    client.setQueryData(classKeys.roster("c1"), { names: [] });
    client.setQueryData(classKeys.detail("c2"), { id: "c2" });

    await client.invalidateQueries({ queryKey: classKeys.lists() });
    await client.invalidateQueries({ queryKey: classKeys.detail("c1") });

    const stale = (key: readonly unknown[]) => client.getQueryState(key)?.isInvalidated;
    expect(stale(classKeys.list({ archived: "exclude" }))).toBe(true);
    expect(stale(classKeys.list({ archived: "only" }))).toBe(true);
    expect(stale(classKeys.detail("c1"))).toBe(true);
    expect(stale(classKeys.roster("c1"))).toBe(true);
    expect(stale(classKeys.detail("c2"))).toBe(false);
  });
});
