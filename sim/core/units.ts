/**
 * Internal scale of the simulation.
 *
 * The API speaks SI (metres, seconds, kilograms, newtons). Inside, matter-js works in
 * millimetres and milliseconds, with masses in kilograms. Two reasons:
 * - matter's fixed tolerances (contact slop 0.05, resting thresholds) are tuned for
 *   bodies a few to a few hundred units across; links of 5–30 mm sit in that range;
 * - with mm and ms, g = 9.81 m/s² is 9.81e-3 mm/ms², and matter's default gravity
 *   (y = 1, scale 0.001 per ms²) has exactly the same form, so its Verlet step needs no
 *   other factor.
 * Internal y points down (matter's convention); the API's heights point up.
 */
export const MM_PER_M = 1000;
export const MS_PER_S = 1000;

/** Standard value used throughout the reference check values (physics-reference §3). */
export const G_SI = 9.81;
/** g in mm/ms². */
export const G_INTERNAL = (G_SI * MM_PER_M) / (MS_PER_S * MS_PER_S);

export const mm = (metres: number) => metres * MM_PER_M;
export const metres = (millimetres: number) => millimetres / MM_PER_M;
export const ms = (seconds: number) => seconds * MS_PER_S;
export const seconds = (milliseconds: number) => milliseconds / MS_PER_S;
/** mm/ms → m/s: the factor is 1. Kept as a function so call sites say what they convert. */
export const metresPerSecond = (mmPerMs: number) => mmPerMs;
/**
 * A position correction of (C/w) kg·mm applied within one step of dt ms is an impulse of
 * (C/w)/dt kg·m/s (N·s); spread over the step it is a force of (C/w)/dt² × 1000 N.
 */
export const newtonsFromCorrection = (kgMm: number, dtMs: number) => (kgMm / (dtMs * dtMs)) * 1000;
