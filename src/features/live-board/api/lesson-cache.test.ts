import { describe, expect, it } from "vitest";
import type { TeacherLesson, TeacherTrial } from "@contracts/lessons";
import {
  currentTrialOf,
  joinedCountOf,
  mergeAnswersCounted,
  mergeExplanation,
  mergeParticipantsCounted,
  mergePrediction,
  replaceLesson,
} from "./lesson-cache";

const trial = (id: string): TeacherTrial => ({
  id,
  position: 1,
  rig: "fountain",
  rigLabel: "Chain fountain",
  rigSummary: "",
  params: {},
  shownParams: [],
  question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true },
  phase: "predict",
  answered: { 1: 0, 2: 0 },
  result: null,
  theory: null,
  notes: [],
  seed: null,
  measured: null,
  theoryValues: null,
  predictions: [],
  explanations: [],
  tally: { 1: null, 2: null },
  ranAt: null,
});

const lesson: TeacherLesson = {
  id: "L1",
  code: "ACEF34",
  classId: "C1",
  className: "Year 12 Physics (invented)",
  status: "open",
  showNames: false,
  planTitle: null,
  startedAt: "2026-01-01T09:00:00Z",
  endedAt: null,
  currentTrialId: "T2",
  participants: [
    { id: "p1", displayName: "Ada B.", online: true },
    { id: "p2", displayName: "Cy D.", online: false },
  ],
  trials: [trial("T1"), trial("T2")],
  joinUrl: "http://127.0.0.1/join/ACEF34",
};

const prediction = (id: string, value: number) => ({
  id,
  participantId: "p1",
  participantName: "Ada B.",
  round: 1 as const,
  value,
  choice: null,
  reason: "",
  createdAt: "2026-01-01T09:05:00Z",
});

describe("teacher lesson cache merges", () => {
  it("a new prediction is added to its trial only, and a changed one replaces the old", () => {
    const live = replaceLesson(lesson);
    const once = mergePrediction(live, { trialId: "T2", prediction: prediction("x", 12) });
    expect(once.trials[1]!.predictions.map((p) => p.value)).toEqual([12]);
    expect(once.trials[0]!.predictions).toEqual([]);
    const changed = mergePrediction(once, { trialId: "T2", prediction: prediction("x", 15) });
    expect(changed.trials[1]!.predictions.map((p) => p.value)).toEqual([15]);
    // The old object is untouched (the cache compares by reference).
    expect(once.trials[1]!.predictions.map((p) => p.value)).toEqual([12]);
    expect(changed).not.toBe(once);
  });

  it("a broadcast about a trial not in the view leaves the view as it was", () => {
    const live = replaceLesson(lesson);
    expect(mergePrediction(live, { trialId: "T9", prediction: prediction("x", 1) })).toBe(live);
  });

  it("explanations are added with their shown flag, and re-sent ones replace the old", () => {
    const live = replaceLesson(lesson);
    const explanation = { id: "e1", participantId: "p1", participantName: "Ada B.", text: "The pile pushes.", shown: false, createdAt: "" };
    const a = mergeExplanation(live, { trialId: "T2", explanation });
    const b = mergeExplanation(a, { trialId: "T2", explanation: { ...explanation, shown: true } });
    expect(b.trials[1]!.explanations).toHaveLength(1);
    expect(b.trials[1]!.explanations[0]!.shown).toBe(true);
  });

  it("answer counts update the right round of the right trial", () => {
    const live = replaceLesson(lesson);
    const next = mergeAnswersCounted(live, { trialId: "T2", round: 2, count: 7 });
    expect(next.trials[1]!.answered).toEqual({ 1: 0, 2: 7 });
    expect(next.trials[0]!.answered).toEqual({ 1: 0, 2: 0 });
  });

  it("the joined count is the online participants until a count arrives, then the count; another lesson's count is ignored", () => {
    const live = replaceLesson(lesson);
    expect(joinedCountOf(live)).toBe(1);
    const counted = mergeParticipantsCounted(live, { lessonId: "L1", count: 24 });
    expect(joinedCountOf(counted)).toBe(24);
    expect(mergeParticipantsCounted(counted, { lessonId: "L2", count: 3 })).toBe(counted);
    // A full view starts again from its own list.
    expect(joinedCountOf(replaceLesson({ ...lesson, participants: [] }))).toBe(0);
  });

  it("finds the current trial, or none", () => {
    expect(currentTrialOf(lesson)?.id).toBe("T2");
    expect(currentTrialOf({ ...lesson, currentTrialId: null })).toBeNull();
  });
});
