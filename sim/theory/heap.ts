/**
 * Lifting a chain off a heap at constant speed.
 */
import { STANDARD_G } from "./constants";
import { gravity, nonNegative, positive } from "./guard";

export interface HeapLiftInput {
  /** Mass per unit length, kg/m. */
  lambda: number;
  /** Height y of the lifted end above the heap (= length already lifted), m, ≥ 0. */
  height: number;
  /** Constant lifting speed v, m/s, ≥ 0. */
  speed: number;
  g?: number;
}

/**
 * Pulling force needed to lift the end at constant speed, N: F = λgy + λv².
 *
 * Source [textbook]: the lifted part weighs λgy, and each second a mass λv is brought from rest
 * to v, which needs the extra force λv² (momentum flux), as in loading a conveyor belt.
 */
export function heapLiftForce(input: HeapLiftInput): number {
  const lambda = positive("lambda", input.lambda, "kg/m");
  const y = nonNegative("height", input.height, "m");
  const v = nonNegative("speed", input.speed, "m/s");
  const g = gravity(input.g, STANDARD_G);
  return lambda * g * y + lambda * v * v;
}

export interface HeapLiftPower {
  /** Power delivered by the pull, F·v = λgyv + λv³, W. */
  input: number;
  /** Rate of gain of potential energy of the lifted part, λgyv, W. */
  toPotential: number;
  /** Power of the λv² (pick-up) part of the pull, λv³, W. */
  pickUp: number;
  /** Rate of gain of kinetic energy, ½λv³, W: half the pick-up power. */
  toKinetic: number;
  /** Rate of dissipation at the heap, ½λv³, W: the other half. */
  dissipated: number;
}

/**
 * Power budget for lifting off a heap at constant speed [textbook]. The pick-up part of the pull
 * delivers λv³ but the new moving chain only gains ½λv³ of kinetic energy; the other half is
 * dissipated in the jerk, as when sand drops onto a conveyor belt moving at V: power (dm/dt)V²,
 * half of it to kinetic energy.
 */
export function heapLiftPower(input: HeapLiftInput): HeapLiftPower {
  const force = heapLiftForce(input);
  const { lambda, height: y, speed: v } = input;
  const g = gravity(input.g, STANDARD_G);
  const pickUp = lambda * v ** 3;
  return {
    input: force * v,
    toPotential: lambda * g * y * v,
    pickUp,
    toKinetic: 0.5 * pickUp,
    dissipated: 0.5 * pickUp,
  };
}
