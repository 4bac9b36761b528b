/**
 * Closed forms for the chain fountain: steady speed and rise, tensions, energy budget,
 * growth without a floor, and the shape over a tilted pot.
 *
 * Notation (physics-reference.md §1): λ mass per unit length (kg/m), v steady chain speed,
 * h1 = height of the pot (top of the pile) above the floor, h2 = height of the crest above the pot,
 * α = pot push as a fraction of the momentum flux λv² (R = αλv²), β = floor pull as the same
 * fraction (T_floor = βλv²).
 */
import { STANDARD_G } from "./constants";
import { finite, gravity, nonNegative, positive } from "./guard";

/**
 * Typical pot-push coefficient α (dimensionless).
 *
 * Source: an examiners' fit of supplied measurements, Singapore Physics Olympiad Training,
 * examiner's report, 2018 selection test, problem 1 (α ≈ 0.12 with β ≈ 0).
 * Honest note [memory]: real chains are reported to rise to h2/h1 of order 0.1; with α = 0.12,
 * β = 0 the steady theory gives h2/h1 = 0.136, the same order. Teachers may change it.
 */
export const TYPICAL_ALPHA = 0.12;

/** Typical floor-pull coefficient β (dimensionless); same source as {@link TYPICAL_ALPHA}. */
export const TYPICAL_BETA = 0;

function pushCoefficients(alpha: number, beta: number): void {
  nonNegative("alpha", alpha, "");
  nonNegative("beta", beta, "");
  if (!(alpha + beta < 1)) {
    throw new RangeError(
      `alpha + beta must be below 1 (got alpha = ${alpha}, beta = ${beta}): the chain would need no gravity to move`,
    );
  }
}

export interface FountainInput {
  /** h1: top of the pile above the floor, m (> 0). */
  potHeight: number;
  /** Pot push coefficient α ≥ 0 (R = αλv²). */
  alpha: number;
  /** Floor pull coefficient β ≥ 0 (T_floor = βλv²); α + β < 1. */
  beta: number;
  /** Mass per unit length, kg/m. When omitted, tensions and push are given per unit λ. */
  lambda?: number;
  /** Gravity, m/s²; defaults to {@link STANDARD_G}. */
  g?: number;
}

export interface FountainSteady {
  /** Chain speed v, m/s. */
  speed: number;
  /** h2: height of the crest above the pot, m. */
  rise: number;
  /** h2/h1 (dimensionless). */
  riseRatio: number;
  /** Tension just above the pile, (1 − α)λv². In N if `lambda` was given, else N per (kg/m) = m²/s². */
  tensionPot: number;
  /** Tension where the chain meets the floor, βλv² (N, or per unit λ). */
  tensionFloor: number;
  /** Tension at the crest, λv² (N, or per unit λ): the chain turns sharply there. */
  tensionCrest: number;
  /** Push of the pile on the chain, R = αλv² (N, or per unit λ). */
  potPush: number;
}

/**
 * Steady chain fountain.
 *
 * Source [paper]: J. S. Biggins & M. Warner, "Understanding the chain fountain",
 * Proc. R. Soc. A 470: 20130689 (2014).
 * For a chain moving along itself at constant speed, T − λgz is constant along the chain
 * [derived, standard moving-string result]. With z measured from the floor:
 *   at the floor  T = βλv², z = 0;   at the pot  T = (1 − α)λv², z = h1
 *   ⇒ (1 − α − β)λv² = λgh1  ⇒  v² = g·h1/(1 − α − β).
 * At the crest the chain turns sharply, so there T = λv² (tension minus momentum flux vanishes):
 *   λv² − (1 − α)λv² = λg·h2  ⇒  g·h2 = α·v²  ⇒  h2/h1 = α/(1 − α − β).
 *
 * @throws RangeError when potHeight ≤ 0, α < 0, β < 0, α + β ≥ 1, λ ≤ 0 or g ≤ 0.
 */
export function fountainSteady(input: FountainInput): FountainSteady {
  const h1 = positive("potHeight", input.potHeight, "m");
  const { alpha, beta } = input;
  pushCoefficients(alpha, beta);
  const lambda = input.lambda === undefined ? 1 : positive("lambda", input.lambda, "kg/m");
  const g = gravity(input.g, STANDARD_G);

  const speedSquared = (g * h1) / (1 - alpha - beta);
  const flux = lambda * speedSquared; // momentum flux λv², N
  const rise = (alpha * speedSquared) / g;
  return {
    speed: Math.sqrt(speedSquared),
    rise,
    riseRatio: alpha / (1 - alpha - beta),
    tensionPot: (1 - alpha) * flux,
    tensionFloor: beta * flux,
    tensionCrest: flux,
    potPush: alpha * flux,
  };
}

export interface FountainEnergyInput {
  potHeight: number;
  alpha: number;
  beta: number;
  /** Mass per unit length, kg/m (required: powers are in W). */
  lambda: number;
  g?: number;
}

export interface FountainEnergyBudget {
  /** Gravitational power released, λ·v·g·h1, W (mass λv per second falls h1). */
  released: number;
  /** Kinetic energy carried by the moving chain per second, ½λv³, W. Created at the pile, destroyed at the floor. */
  kineticFlux: number;
  /** Power dissipated where links are picked up from the pile, (½ − α)λv³, W. */
  lostAtPile: number;
  /** Power dissipated where links land on the floor, (½ − β)λv³, W. */
  lostAtFloor: number;
}

/**
 * Where the power goes in a steady fountain [derived from Biggins & Warner 2014, above].
 *
 * At the pile: links go from rest to v. The tension just above the pile pulls material at speed v,
 * delivering (1 − α)λv²·v; the pile pushes but its contact point does not move, so it does no work.
 * Kinetic energy gained is ½λv³, so lost at the pile = (1 − α)λv³ − ½λv³ = (½ − α)λv³.
 * At the floor: links arrive carrying ½λv³; the chain above pulls back with βλv² on material moving
 * at v, taking βλv³ back up the chain, so lost at the floor = ½λv³ − βλv³ = (½ − β)λv³.
 * Sum of losses = (1 − α − β)λv³ = λv·[(1 − α − β)v²] = λv·g·h1 = released: in the steady state every
 * joule released by the falling chain is dissipated at the two ends; the kinetic flux only carries
 * energy from the pile to the floor.
 * A passive pile cannot supply energy, so this refuses α > ½ (and β > ½), where a "loss" would be negative.
 *
 * @throws RangeError as {@link fountainSteady}, and when α > ½ or β > ½.
 */
export function fountainEnergyBudget(input: FountainEnergyInput): FountainEnergyBudget {
  const lambda = positive("lambda", input.lambda, "kg/m");
  const { speed } = fountainSteady(input);
  if (input.alpha > 0.5) throw new RangeError(`alpha must be at most 0.5 for the energy budget (got ${input.alpha}): the pile would be a source of energy`);
  if (input.beta > 0.5) throw new RangeError(`beta must be at most 0.5 for the energy budget (got ${input.beta}): the floor would be a source of energy`);
  const g = gravity(input.g, STANDARD_G);
  const cube = lambda * speed ** 3; // λv³, W
  return {
    released: lambda * speed * g * input.potHeight,
    kineticFlux: 0.5 * cube,
    lostAtPile: (0.5 - input.alpha) * cube,
    lostAtFloor: (0.5 - input.beta) * cube,
  };
}

/**
 * A fountain with no floor: the free end keeps falling and the fountain grows ∝ t².
 *
 * Source: J. S. Biggins, "Growth and shape of a chain fountain", EPL 106, 44001 (2014)
 * [volume from memory]; the closed forms are [derived] under these assumptions:
 * the whole moving chain has one speed v; the pot push is αλv² (tension above the pile (1 − α)λv²);
 * the chain in the arch above the pot is neglected in the momentum balance; the arch is quasi-steady.
 * Momentum along the moving chain, free end a depth z below the pot (zero tension there):
 *   λ·z·dv/dt = λ·g·z − (1 − α)λv².
 * Try constant acceleration from rest, v² = 2·a·z:  a·z = g·z − 2(1 − α)a·z  ⇒  a = g/(3 − 2α).
 * Quasi-steady arch, g·h2 = α·v² = 2α·a·z  ⇒  h2/z = 2α/(3 − 2α).
 *
 * @param alpha pot push coefficient, 0 ≤ α < 1.
 * @returns accelRatio = a/g of the falling end, riseRatio = h2/z (both dimensionless).
 */
export function noFloorGrowth(alpha: number): { accelRatio: number; riseRatio: number } {
  pushCoefficients(alpha, 0);
  return { accelRatio: 1 / (3 - 2 * alpha), riseRatio: (2 * alpha) / (3 - 2 * alpha) };
}

export interface TiltedPotInput {
  /** Mass per unit length, kg/m. */
  lambda: number;
  /** Chain speed v, m/s. */
  speed: number;
  /** Tension at the apex of the arch, N; must be below λv². */
  apexTension: number;
  g?: number;
}

/**
 * Shape of the arch over a tilted pot: an inverted catenary.
 *
 * Source: J. S. Biggins, EPL 106, 44001 (2014) [paper: inverted catenary; formula derived].
 * A steadily moving chain obeys the hanging-chain equations with T replaced by T − λv²
 * (Biggins & Warner 2014). At the apex T − λv² < 0, so the "static" chain is in compression and
 * the catenary is upside down: z = −a[cosh(x/a) − 1] with a = (λv² − T_apex)/(λg).
 *
 * @returns a in m, and z(x): height in m relative to the apex at horizontal distance x (m) from it.
 * @throws RangeError unless 0 ≤ apexTension < λv² (at λv² the arch degenerates into a vertical fountain).
 */
export function tiltedPotShape(input: TiltedPotInput): { a: number; z: (x: number) => number } {
  const lambda = positive("lambda", input.lambda, "kg/m");
  const speed = positive("speed", input.speed, "m/s");
  const apexTension = nonNegative("apexTension", input.apexTension, "N");
  const g = gravity(input.g, STANDARD_G);
  const flux = lambda * speed * speed;
  if (!(apexTension < flux)) {
    throw new RangeError(`apexTension must be below λv² = ${flux} N (got ${apexTension} N)`);
  }
  const a = (flux - apexTension) / (lambda * g);
  return { a, z: (x: number) => a * (1 - Math.cosh(finite("x", x, "m") / a)) };
}
