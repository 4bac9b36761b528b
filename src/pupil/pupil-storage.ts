/**
 * What a pupil's device keeps, per lesson code, in localStorage: the resume token (so a reload
 * rejoins as the same participant), the display name, the pupil's own answers, and answers not
 * yet confirmed by the server. Nothing else is stored.
 */
import type { ExplanationInput, PredictionInput, PupilSession } from "@contracts/lessons";

export type OwnPrediction = PupilSession["mine"]["predictions"][number];
export type OwnExplanation = PupilSession["mine"]["explanations"][number];

export type OutboxEntry =
  | { kind: "prediction"; clientId: string; payload: PredictionInput & { clientId: string } }
  | { kind: "explanation"; clientId: string; payload: ExplanationInput & { clientId: string } };

export interface StoredLesson {
  code: string;
  resumeToken: string;
  participantId: string;
  displayName: string;
  mine: PupilSession["mine"];
  outbox: OutboxEntry[];
}

/** The parts of the Storage API used here, so tests can pass a plain map. */
export type KeyValueStore = Pick<Storage, "getItem" | "setItem" | "removeItem">;

export const storageKey = (code: string) => `linkleap.pupil.${code}`;

export function readStoredLesson(store: KeyValueStore, code: string): StoredLesson | null {
  let raw: string | null;
  try {
    raw = store.getItem(storageKey(code));
  } catch {
    return null;
  }
  if (!raw) return null;
  try {
    const value = JSON.parse(raw) as Partial<StoredLesson>;
    if (typeof value.resumeToken !== "string" || typeof value.participantId !== "string") return null;
    return {
      code,
      resumeToken: value.resumeToken,
      participantId: value.participantId,
      displayName: typeof value.displayName === "string" ? value.displayName : "",
      mine: {
        predictions: Array.isArray(value.mine?.predictions) ? value.mine.predictions : [],
        explanations: Array.isArray(value.mine?.explanations) ? value.mine.explanations : [],
      },
      outbox: Array.isArray(value.outbox) ? value.outbox : [],
    };
  } catch {
    // A damaged entry is worth less than a working page: start again (the pupil rejoins by name).
    return null;
  }
}

export function writeStoredLesson(store: KeyValueStore, lesson: StoredLesson): void {
  try {
    store.setItem(storageKey(lesson.code), JSON.stringify(lesson));
  } catch {
    // Private browsing or a full store: the page still works, it only forgets on reload.
  }
}

export function forgetStoredLesson(store: KeyValueStore, code: string): void {
  try {
    store.removeItem(storageKey(code));
  } catch {
    // Nothing to do: see writeStoredLesson.
  }
}

/** Own answers from the server win; local ones it has not listed yet (just acknowledged) are kept. */
export function mergeMine(server: PupilSession["mine"], local: PupilSession["mine"]): PupilSession["mine"] {
  const predictionIds = new Set(server.predictions.map((p) => p.clientId));
  const explanationIds = new Set(server.explanations.map((e) => e.clientId));
  return {
    predictions: [...server.predictions, ...local.predictions.filter((p) => !predictionIds.has(p.clientId))],
    explanations: [...server.explanations, ...local.explanations.filter((e) => !explanationIds.has(e.clientId))],
  };
}

/** The latest own prediction for a trial and round (a changed answer is a later entry). */
export function latestPrediction(mine: PupilSession["mine"], trialId: string, round: 1 | 2): OwnPrediction | null {
  const list = mine.predictions.filter((p) => p.trialId === trialId && p.round === round);
  return list.at(-1) ?? null;
}

export function latestExplanation(mine: PupilSession["mine"], trialId: string): OwnExplanation | null {
  return mine.explanations.filter((e) => e.trialId === trialId).at(-1) ?? null;
}
