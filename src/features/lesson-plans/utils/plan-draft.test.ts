import { describe, expect, it } from "vitest";
import { lessonPlanInputSchema, type LessonPlan } from "@contracts/lesson-plans";
import { draftForRig } from "@/components/trial-setup/setup-form";
import { draftFingerprint, draftFromPlan, emptyPlanDraft, moveItem, newTrialDraft, planPayload, trialErrors } from "./plan-draft";

const savedPlan = {
  title: "Heights",
  summary: "Two drops",
  shared: true,
  trials: [
    { rig: "fountain", params: { potHeight: 0.5, linkShape: "rod" }, question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm", askReason: true, askExplanation: false, revote: false } },
    { rig: "scale", params: { chainLength: 2, linkShape: "ball" }, question: { kind: "number", prompt: "Reading?", quantity: "readingRatio", unit: "", askReason: false, askExplanation: true, revote: true } },
  ],
} as unknown as LessonPlan;

describe("a plan draft and its request body", () => {
  it("round-trips a saved plan: same trials, same order, same question flags, and the body passes the contract", () => {
    const draft = draftFromPlan(savedPlan);
    expect(draft.trials.map((t) => t.setup.params.potHeight ?? t.setup.params.chainLength)).toEqual(["0.5", "2"]);
    const { payload, errors } = planPayload(draft);
    expect(errors).toEqual({});
    expect(payload!.trials.map((t) => [t.rig, t.params])).toEqual([
      ["fountain", { linkShape: "rod", potHeight: 0.5 }],
      ["scale", { linkShape: "ball", chainLength: 2 }],
    ]);
    expect(payload!.trials[0]!.question).toMatchObject({ askExplanation: false, revote: false });
    expect(payload!.trials[1]!.question).toMatchObject({ askReason: false, askExplanation: true });
    expect(lessonPlanInputSchema.safeParse(payload).success).toBe(true);
  });

  it("keys problems as the server does: title, trials, and trials.<i>.<field>", () => {
    const draft = emptyPlanDraft();
    draft.trials.push(newTrialDraft({ ...draftForRig("fountain"), params: { ...draftForRig("fountain").params, potHeight: "12" } }));
    const { payload, errors } = planPayload(draft);
    expect(payload).toBeNull();
    expect(Object.keys(errors).sort()).toEqual(["title", "trials.1.params.potHeight"]);
    expect(trialErrors(errors, 1)).toEqual({ "params.potHeight": errors["trials.1.params.potHeight"] });
    expect(trialErrors(errors, 0)).toEqual({});
    expect(planPayload({ ...draft, title: "x", trials: [] }).errors).toEqual({ trials: "Add at least one trial." });
  });

  it("a reorder changes the fingerprint; putting it back restores it", () => {
    const draft = draftFromPlan(savedPlan);
    const before = draftFingerprint(draft);
    const moved = { ...draft, trials: moveItem(draft.trials, 1, 0) };
    expect(draftFingerprint(moved)).not.toBe(before);
    expect(draftFingerprint({ ...moved, trials: moveItem(moved.trials, 0, 1) })).toBe(before);
  });
});

describe("moving a trial", () => {
  it("moves up and down, and clamps at the ends", () => {
    expect(moveItem(["a", "b", "c"], 2, 1)).toEqual(["a", "c", "b"]);
    expect(moveItem(["a", "b", "c"], 0, 1)).toEqual(["b", "a", "c"]);
    expect(moveItem(["a", "b", "c"], 0, -1)).toEqual(["a", "b", "c"]);
    expect(moveItem(["a", "b", "c"], 2, 3)).toEqual(["a", "b", "c"]);
    expect(moveItem(["a", "b", "c"], 0, 2)).toEqual(["b", "c", "a"]);
  });
});
