/**
 * The lesson review: what the lesson's own teacher reads after the lesson (names included, so
 * it is never served to anyone else), and the closeness maths shared by the server, its CSV
 * exports and the review page. Plain types and functions: no zod, no sim/.
 */
import { isWithin10, type Round } from "./lesson-rules";
import type { Question, ShownParam, ShownValue, Tally } from "./lessons";

/**
 * How close a number prediction p was to the measured result r, both in the question's unit.
 * Relative error e = (p − r) / |r|: signed (+0.25 means 25 % too high, −0.25 25 % too low) and
 * absolute |e|. "Within 10 %" is |p − r| ≤ 0.1·|r| with a rounding allowance of 1e-9·|r| (the
 * rule the board's summary figures use), so 11 against 10 counts despite binary floating point.
 * With r = 0 a relative error has no meaning: both errors are null and only p = 0 is within.
 */
export interface Closeness {
  signedRelativeError: number | null;
  absoluteRelativeError: number | null;
  within10: boolean;
}

export function closenessOf(prediction: number, result: number): Closeness | null {
  if (!Number.isFinite(prediction) || !Number.isFinite(result)) return null;
  const r = Math.abs(result);
  const within10 = isWithin10(prediction, result);
  if (r === 0) return { signedRelativeError: null, absoluteRelativeError: null, within10 };
  const signed = (prediction - result) / r;
  return { signedRelativeError: signed, absoluteRelativeError: Math.abs(signed), within10 };
}

/** Median and spread of one round's number answers (devices and show of hands together). */
export interface RoundSummary {
  round: Round;
  /** Answers counted: pupils' own and a show of hands. */
  count: number;
  /** Number questions only (null otherwise or without answers). */
  median: number | null;
  lowerQuartile: number | null;
  upperQuartile: number | null;
  /** Interquartile range: upper − lower quartile. */
  spread: number | null;
  min: number | null;
  max: number | null;
  /** Answers within 10 % of the result (null before a result). */
  within10: number | null;
  /** Choice questions: answers per choice, in order (null for a number question). */
  choiceCounts: number[] | null;
}

export interface ReviewPrediction {
  id: string;
  participantId: string;
  pupil: string;
  round: Round;
  value: number | null;
  choice: number | null;
  /** The picked choice's label, for a choice question. */
  choiceLabel: string | null;
  reason: string;
  /** Null for a choice question, or before a result. */
  closeness: Closeness | null;
  submittedAt: string;
}

export interface ReviewExplanation {
  id: string;
  participantId: string;
  pupil: string;
  text: string;
  /** Shown on the board (without the name) during the lesson. */
  shown: boolean;
  submittedAt: string;
}

export interface ReviewTrial {
  id: string;
  position: number;
  rig: string;
  rigLabel: string;
  /** The quantity asked, in words. */
  quantityLabel: string;
  shownParams: ShownParam[];
  question: Question;
  /** When the run was recorded (null: never run). */
  ranAt: string | null;
  result: ShownValue | null;
  theory: ShownValue | null;
  predictions: ReviewPrediction[];
  explanations: ReviewExplanation[];
  tally: Record<Round, Tally | null>;
  summary: Record<Round, RoundSummary>;
}

/** One pupil's answers across the lesson, trial by trial. */
export interface ReviewPupil {
  participantId: string;
  displayName: string;
  predictions: { trialId: string; position: number; round: Round; value: number | null; choice: number | null; closeness: Closeness | null }[];
  predictionCount: number;
  explanationCount: number;
  /** Number answers with a result to compare with, and how many of them were within 10 %. */
  comparedCount: number;
  within10Count: number;
}

export interface LessonReview {
  lesson: {
    id: string;
    classId: string;
    className: string;
    code: string;
    status: "open" | "ended";
    startedAt: string;
    endedAt: string | null;
    planTitle: string | null;
  };
  participants: { id: string; displayName: string }[];
  trials: ReviewTrial[];
  pupils: ReviewPupil[];
}
