import { describe, expect, it } from "vitest";
import { trialSetupSchema } from "@contracts/lessons";
import { RIGS } from "@sim/index";
import { draftForRig, draftFromSetup, fieldMessages, paramFieldsFor, setupPayload, unitsFor, withQuantity } from "./setup-form";

describe("the set-up form's fields", () => {
  it("lists each number parameter of the rig with its label, unit, range and default, and puts the step behind More", () => {
    const fields = paramFieldsFor("fountain");
    const pot = fields.find((f) => f.key === "potHeight")!;
    expect(pot.meta).toMatchObject({ unit: "m", min: 0.2, max: 3, default: 1 });
    expect(pot.advanced).toBe(false);
    expect(fields.find((f) => f.key === "dt")!.advanced).toBe(true);
    expect(fields.find((f) => f.key === "linkLength")).toBeDefined();
    // linkShape is a choice, not a number.
    expect(fields.some((f) => f.key === "linkShape")).toBe(false);
  });

  it("finds the fields of a rig whose schema has a cross-field check (hanging)", () => {
    expect(paramFieldsFor("hanging").map((f) => f.key)).toEqual(expect.arrayContaining(["span", "chainLength", "lambda"]));
  });
});

describe("from the form to trial:setup", () => {
  it("a fresh rig sends only the link shape and its default question, which the server's schema and the rig accept", () => {
    const { payload, errors } = setupPayload(draftForRig("fountain"));
    expect(errors).toEqual({});
    expect(payload).toEqual({
      rig: "fountain",
      params: { linkShape: "rod" },
      question: { kind: "number", prompt: "How high above the rim will the chain rise?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true },
    });
    expect(trialSetupSchema.safeParse(payload).success).toBe(true);
    expect(RIGS.fountain.schema.safeParse(payload!.params).success).toBe(true);
  });

  it("reads typed numbers (a decimal comma too) and leaves empty ones to the rig's default", () => {
    const draft = draftForRig("fountain", "ball");
    draft.params.potHeight = "1,5";
    draft.params.links = " 800 ";
    const { payload } = setupPayload(draft);
    expect(payload!.params).toEqual({ linkShape: "ball", potHeight: 1.5, links: 800 });
  });

  it("refuses out-of-range, non-integer and unreadable numbers beside their fields, naming the range and unit", () => {
    const draft = draftForRig("fountain");
    draft.params.potHeight = "9";
    draft.params.links = "100.5";
    draft.params.lambda = "abc";
    const { payload, errors } = setupPayload(draft);
    expect(payload).toBeNull();
    expect(errors["params.potHeight"]).toBe("Height of the pot above the floor must be from 0.2 to 3 m.");
    expect(errors["params.links"]).toMatch(/whole number from 100 to 4000/);
    expect(errors["params.lambda"]).toBe("Type a number.");
  });

  it("keeps the fountain's α within the range its energy budget holds for (0 to 0.5)", () => {
    const draft = draftForRig("fountain");
    draft.params.theoryAlpha = "0.55";
    expect(setupPayload(draft).errors["params.theoryAlpha"]).toMatch(/from 0 to 0.5/);
    draft.params.theoryAlpha = "0.5";
    draft.params.theoryBeta = "0.4";
    expect(setupPayload(draft).errors).toEqual({});
  });

  it("a choice question sends its choices with optional ranges, and needs at least two", () => {
    const draft = draftForRig("fountain");
    draft.question = { ...draft.question, kind: "choice", choices: [{ label: "Below the rim", min: "", max: "0" }] };
    expect(setupPayload(draft).errors["question.choices"]).toMatch(/at least 2/);
    draft.question.choices.push({ label: "Above the rim", min: "0", max: "" });
    const { payload } = setupPayload(draft);
    expect(payload!.question).toMatchObject({ kind: "choice", choices: [{ label: "Below the rim", min: null, max: 0 }, { label: "Above the rim", min: 0, max: null }] });
    expect(trialSetupSchema.safeParse(payload).success).toBe(true);
  });

  it("a new quantity keeps a unit that fits and otherwise takes the quantity's first unit", () => {
    expect(unitsFor("fountain", "rise")).toEqual(["cm", "m", "mm"]);
    const draft = withQuantity(draftForRig("fountain"), "speed");
    expect(draft.question.unit).toBe("m/s");
    expect(setupPayload(draft).payload!.question.unit).toBe("m/s");
  });

  it("round-trips a stored set-up", () => {
    const stored = { rig: "fountain" as const, params: { linkShape: "tube", potHeight: 2 }, question: { kind: "number" as const, prompt: "How fast?", quantity: "speed", unit: "m/s" } };
    expect(setupPayload(draftFromSetup(stored)).payload).toEqual({ ...stored, question: { ...stored.question, askReason: true, askExplanation: true, revote: true } });
  });

  it("puts the server's field messages beside the same fields", () => {
    expect(fieldMessages({ "params.potHeight": ["too high", "again"], links: ["whole"], "question.prompt": ["Give the question."] })).toEqual({
      "params.potHeight": "too high",
      "params.links": "whole",
      "question.prompt": "Give the question.",
    });
  });
});
