/**
 * Types for the dev dependency `odex` (E. Hairer & G. Wanner's ODEX extrapolation integrator,
 * ported to JavaScript), used by tests as an ODE solver that shares no code with ours.
 *
 * odex ships no declarations, only its TypeScript source next to the JavaScript
 * (node_modules/odex/src/odex.ts). A static `import … from "odex"` makes TypeScript resolve to that
 * source and type-check it under our strict settings, where it does not compile. So tests load it
 * with a dynamic import whose specifier TypeScript does not follow, and type the result with this
 * global namespace, which mirrors the parts of odex.ts the tests use:
 *
 *   const ODEX = "odex";
 *   const { Solver } = (await import(ODEX)) as Odex.Module;
 */
declare namespace Odex {
  /** y' = f(x, y); returns an array of length n. */
  type Derivative = (x: number, y: number[]) => number[];

  /**
   * Called after each accepted step with the step number, the step's interval [xOld, x] and y(x).
   * With `denseOutput`, `dense(component, t)` interpolates y[component] anywhere in [xOld, x].
   * Return false to stop the integration early.
   */
  type OutputFunction = (
    nr: number,
    xOld: number,
    x: number,
    y: number[],
    dense?: (component: number, t: number) => number,
  ) => boolean | void;

  /** 0 converged, 1 maximum steps exceeded, 2 stopped early by the output function. */
  type Outcome = 0 | 1 | 2;

  interface Solution {
    y: number[];
    outcome: Outcome;
    nStep: number;
    xEnd: number;
    nAccept: number;
    nReject: number;
    nEval: number;
  }

  interface Solver {
    n: number;
    maxSteps: number;
    initialStepSize: number;
    maxStepSize: number;
    denseOutput: boolean;
    relativeTolerance: number | number[];
    absoluteTolerance: number | number[];
    /** Output function sampling the dense solution every dt (needs denseOutput = true). */
    grid(dt: number, out: (x: number, y: number[]) => boolean | void): OutputFunction;
    /** Integrate y' = f from x to xEnd starting at y0. */
    solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): Solution;
  }

  interface Module {
    Solver: new (n: number) => Solver;
  }
}
