import { describe, expect, it } from "vitest";
import { draftForRig } from "@/components/trial-setup/setup-form";
import { crestRiseSi, previewNumbers } from "./preview-geometry";

describe("what the rig preview draws", () => {
  it("uses typed values in range, and the rig's defaults for empty, half-typed or out-of-range ones", () => {
    const draft = draftForRig("fountain");
    expect(previewNumbers(draft).potHeight).toBe(1);
    expect(previewNumbers({ ...draft, params: { ...draft.params, potHeight: "1,5" } }).potHeight).toBe(1.5);
    expect(previewNumbers({ ...draft, params: { ...draft.params, potHeight: "1." } }).potHeight).toBe(1);
    expect(previewNumbers({ ...draft, params: { ...draft.params, potHeight: "9" } }).potHeight).toBe(1);
    expect(previewNumbers({ ...draft, params: { ...draft.params, potHeight: "abc" } }).potHeight).toBe(1);
  });

  it("converts the theory's rise back to metres for the crest mark, whatever unit the question uses", () => {
    const draft = draftForRig("fountain");
    expect(crestRiseSi(draft, { value: 13, uncertainty: null, unit: "cm" })).toBeCloseTo(0.13, 10);
    expect(crestRiseSi(draft, { value: 130, uncertainty: null, unit: "mm" })).toBeCloseTo(0.13, 10);
    const ratio = { ...draft, params: { ...draft.params, potHeight: "2" }, question: { ...draft.question, quantity: "riseRatio", unit: "" } };
    expect(crestRiseSi(ratio, { value: 0.1, uncertainty: null, unit: "" })).toBeCloseTo(0.2, 10);
    expect(crestRiseSi({ ...draft, question: { ...draft.question, quantity: "speed", unit: "m/s" } }, { value: 3, uncertainty: null, unit: "m/s" })).toBeNull();
    expect(crestRiseSi(draftForRig("scale"), { value: 3, uncertainty: null, unit: "" })).toBeNull();
  });
});
