import { describe, expect, it } from "vitest";
import { defaultParams, theoryFor } from "./lessons.service";
import { THEORY_LINKS, theoryParams } from "./setup-theory";

describe("the theory of a set-up (plans, and trials not yet run)", () => {
  it("is the same on the shortest fountain chain as on the one the lesson will run (any drop, shape, α and β)", () => {
    const cases = [
      { potHeight: 0.5, linkShape: "rod" },
      { potHeight: 1.5, linkShape: "bead-thread", links: 2500 },
      { potHeight: 2.2, linkShape: "ball", theoryAlpha: 0.2, theoryBeta: 0.1, lambda: 0.2 },
    ];
    for (const change of cases) {
      const params = { ...defaultParams("fountain"), ...change };
      const full = theoryFor("fountain", params, 1);
      expect(theoryFor("fountain", theoryParams({ rig: "fountain", params }), 1)).toEqual(full);
      expect(full.rise).toBeGreaterThan(0);
    }
    expect(theoryParams({ rig: "fountain", params: { links: 1000 } }).links).toBe(THEORY_LINKS);
  });

  it("leaves other rigs' parameters as they are", () => {
    const params = { chainLength: 2 };
    expect(theoryParams({ rig: "scale", params })).toBe(params);
  });
});
