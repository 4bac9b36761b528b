import { z } from "zod";
import { mm } from "../core/units";
import { describedNumber } from "../params";

export const LINK_SHAPES = ["rod", "tube", "ball", "bead-thread"] as const;
export type LinkShape = (typeof LINK_SHAPES)[number];

export const LINK_SHAPE_LABELS: Record<LinkShape, string> = {
  rod: "Rigid rods",
  tube: "Hollow tubes on a string",
  ball: "Ball chain",
  "bead-thread": "Heavy beads on slack threads",
};

/** What a teacher can choose about the chain itself (SI units). */
export const chainSchema = z.object({
  linkShape: z.enum(LINK_SHAPES, { error: `Link shape must be one of ${LINK_SHAPES.join(", ")}` }).default("rod").describe("Link shape"),
  linkLength: describedNumber("Link length (joint to joint)", "m", 0.01, 0.05, 0.02),
  aspectRatio: describedNumber("Link length ÷ thickness", "", 2, 10, 5),
  lambda: describedNumber("Mass per length", "kg/m", 0.005, 1, 0.05),
});
export type ChainSpec = z.infer<typeof chainSchema>;

/** One rigid element of the chain, in internal units (mm, kg). Joints sit at ±pitch/2 on its axis. */
export interface ElementSpec {
  kind: "rod" | "tube" | "ball" | "bead" | "thread";
  pitch: number;
  /** Rectangle length (rod, tube, thread) or circle diameter (ball, bead). */
  length: number;
  thickness: number;
  mass: number;
  /** Rotational inertia about the centre, kg·mm² (physical, not matter's 4× polygon value). */
  inertia: number;
}

/** Threads between beads: number of light segments per gap, and their share of the mass. */
const THREAD_SEGMENTS = 3;
const THREAD_MASS_SHARE = 0.25;
const THREAD_THICKNESS_MM = 0.8;

/**
 * The repeating pattern of elements for one link pitch. Geometry choices (common practice
 * for toy models, not from a source): tubes fill 80 % of the pitch with string between;
 * balls are 60 % of the pitch across; beads are pitch/aspect across, 75 % of the mass.
 */
export function elementPattern(chain: ChainSpec): ElementSpec[] {
  const p = mm(chain.linkLength);
  const massPerPitch = chain.lambda * chain.linkLength;
  const thickness = p / chain.aspectRatio;
  switch (chain.linkShape) {
    case "rod":
      return [{ kind: "rod", pitch: p, length: p, thickness, mass: massPerPitch, inertia: (massPerPitch * (p * p + thickness * thickness)) / 12 }];
    case "tube": {
      const length = 0.8 * p;
      const radius = thickness / 2;
      // Thin-walled cylinder about a diameter through its centre: m(R²/2 + ℓ²/12) [textbook].
      return [{ kind: "tube", pitch: p, length, thickness, mass: massPerPitch, inertia: massPerPitch * ((radius * radius) / 2 + (length * length) / 12) }];
    }
    case "ball": {
      const diameter = 0.6 * p;
      const radius = diameter / 2;
      // Solid sphere: (2/5) m R² [textbook].
      return [{ kind: "ball", pitch: p, length: diameter, thickness: diameter, mass: massPerPitch, inertia: 0.4 * massPerPitch * radius * radius }];
    }
    case "bead-thread": {
      const diameter = Math.max(thickness, 2);
      const radius = diameter / 2;
      const beadMass = massPerPitch * (1 - THREAD_MASS_SHARE);
      const threadLength = (p - diameter) / THREAD_SEGMENTS;
      const threadMass = (massPerPitch * THREAD_MASS_SHARE) / THREAD_SEGMENTS;
      const thread: ElementSpec = {
        kind: "thread",
        pitch: threadLength,
        length: threadLength,
        thickness: THREAD_THICKNESS_MM,
        mass: threadMass,
        inertia: (threadMass * threadLength * threadLength) / 12,
      };
      return [{ kind: "bead", pitch: diameter, length: diameter, thickness: diameter, mass: beadMass, inertia: 0.4 * beadMass * radius * radius }, ...Array.from({ length: THREAD_SEGMENTS }, () => thread)];
    }
  }
}

/**
 * Joint iterations a chain needs: heavy beads hung on light thread segments stretch the
 * threads unless the joint solve runs more often (mass ratios far from 1 converge slowly).
 */
export const jointIterationsFor = (chain: ChainSpec) => (chain.linkShape === "bead-thread" ? 8 : 2);

/**
 * The geometry the ideal pick-up bound needs (physics-reference §1, "Link geometry → pot
 * push"), in metres: a = lever arm of the lifting pull, b = lever arm of the surface contact,
 * k = radius of gyration. For a ball or a bead the surface touches straight under the centre
 * (b = 0), so the ideal bound gives no push at all.
 */
export function pickUpGeometry(chain: ChainSpec): { a: number; b: number; k: number } {
  const [first] = elementPattern(chain);
  const element = first!;
  const k = Math.sqrt(element.inertia / element.mass) / 1000;
  if (element.kind === "ball" || element.kind === "bead") return { a: element.pitch / 2000, b: 0, k };
  return { a: element.length / 2000, b: element.length / 2000, k };
}
