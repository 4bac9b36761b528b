import { describe, expect, it } from "vitest";
import { RIG_CATALOG, RIG_IDS } from "./catalog";
import { RIGS } from "./index";

describe("rig catalog", () => {
  it("has one entry per rig id, each under its own id", () => {
    expect(Object.keys(RIG_CATALOG).sort()).toEqual([...RIG_IDS].sort());
    for (const id of RIG_IDS) expect(RIG_CATALOG[id].id).toBe(id);
  });

  it("each rig's builder carries its catalog entry, not a copy of it (same schema object, same words)", () => {
    for (const id of RIG_IDS) {
      const { create, ...described } = RIGS[id];
      expect(typeof create).toBe("function");
      expect(described).toEqual(RIG_CATALOG[id]);
      expect(RIGS[id].schema).toBe(RIG_CATALOG[id].schema);
    }
  });

  it("accepts an empty set-up for every rig (all defaults)", () => {
    for (const id of RIG_IDS) expect(RIG_CATALOG[id].schema.safeParse({}).success).toBe(true);
  });
});
