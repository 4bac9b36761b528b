import { z } from "zod";
import { HEIGHT_UNITS, METRES_PER } from "./bench";

/**
 * Heights measured on a photo of a real chain fountain.
 *
 * The teacher marks five points, in the photo's own pixels (x to the right, y down): the rim
 * (top of the pile), the crest (the chain's highest point), the floor, and the two ends of an
 * object of known length. The scale is that length over the pixel distance between its ends
 * (straight-line distance, so the object may lie at any angle). Heights are then vertical
 * distances along the image's y axis: pot height = floor − rim, rise = rim − crest.
 *
 * This assumes the camera faces the set-up squarely (no tilt, little lens distortion) and the
 * reference object stands in the same plane as the chain: otherwise perspective changes the
 * scale across the picture. The UI says so beside the marks.
 */
export interface PixelPoint {
  x: number;
  y: number;
}

export const PHOTO_MARKS = ["rim", "crest", "floor", "referenceStart", "referenceEnd"] as const;
export type PhotoMark = (typeof PHOTO_MARKS)[number];
export type PhotoMarks = Record<PhotoMark, PixelPoint>;

export const PHOTO_MARK_LABELS: Record<PhotoMark, string> = {
  rim: "Rim (top of the pile)",
  crest: "Highest point of the chain",
  floor: "Floor",
  referenceStart: "Known length: one end",
  referenceEnd: "Known length: other end",
};

/** Fewer pixels than this across the reference makes the scale too coarse to trust. */
export const MIN_REFERENCE_PIXELS = 20;

export type PhotoMeasureResult =
  | {
      ok: true;
      /** Metres per image pixel. */
      metresPerPixel: number;
      referencePixels: number;
      /** Floor to rim, m. */
      potHeightM: number;
      /** Rim to the chain's highest point, m. */
      riseM: number;
    }
  | { ok: false; problem: "reference_too_short" | "floor_not_below_rim" | "crest_below_rim" | "bad_length"; message: string };

/**
 * Pot height and rise in metres from the five marks and the reference length in metres.
 * Pure: no DOM, no units other than metres and pixels.
 */
export function measurePhoto(marks: PhotoMarks, referenceLengthM: number): PhotoMeasureResult {
  if (!(Number.isFinite(referenceLengthM) && referenceLengthM > 0)) {
    return { ok: false, problem: "bad_length", message: "Give the known length as a positive number." };
  }
  const referencePixels = Math.hypot(
    marks.referenceEnd.x - marks.referenceStart.x,
    marks.referenceEnd.y - marks.referenceStart.y,
  );
  if (referencePixels < MIN_REFERENCE_PIXELS) {
    return {
      ok: false,
      problem: "reference_too_short",
      message: `The two ends of the known length are under ${MIN_REFERENCE_PIXELS} pixels apart: mark the ends of a longer object.`,
    };
  }
  const metresPerPixel = referenceLengthM / referencePixels;
  const potPixels = marks.floor.y - marks.rim.y;
  const risePixels = marks.rim.y - marks.crest.y;
  if (potPixels <= 0) {
    return { ok: false, problem: "floor_not_below_rim", message: "The floor mark must be below the rim mark." };
  }
  if (risePixels < 0) {
    return { ok: false, problem: "crest_below_rim", message: "The chain's highest point must be at or above the rim mark." };
  }
  return { ok: true, metresPerPixel, referencePixels, potHeightM: potPixels * metresPerPixel, riseM: risePixels * metresPerPixel };
}

const pixel = z.number({ error: "Each mark needs x and y in pixels." }).finite().min(0).max(100_000);
const pointSchema = z.object({ x: pixel, y: pixel }, { error: "Place this mark on the photo." });

/** What the client sends to save a measurement; the server computes the heights itself. */
export const photoMeasurementInputSchema = z.object({
  marks: z.object({
    rim: pointSchema,
    crest: pointSchema,
    floor: pointSchema,
    referenceStart: pointSchema,
    referenceEnd: pointSchema,
  }),
  referenceLength: z.number({ error: "Give the known length as a number." }).positive("The known length must be above zero."),
  referenceUnit: z.enum(HEIGHT_UNITS, { error: "Choose m, cm or mm for the known length." }),
  note: z.string().max(200, "Keep the note to 200 characters or fewer.").default(""),
});
export type PhotoMeasurementInput = z.input<typeof photoMeasurementInputSchema>;

/** The known length in metres. */
export const referenceMetres = (length: number, unit: (typeof HEIGHT_UNITS)[number]) => length * METRES_PER[unit];
