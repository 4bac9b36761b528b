/**
 * Fields and signatures of matter-js 0.20 that @types/matter-js (written for 0.17) lacks.
 * Checked against node_modules/matter-js/src (Body.update, Resolver.solvePosition, Pairs).
 */
import "matter-js";

declare module "matter-js" {
  interface Body {
    /** Position at the previous step: matter's Verlet velocity is position − positionPrev. */
    positionPrev: Vector;
    anglePrev: number;
    deltaTime: number;
  }
  interface Pairs {
    list: Pair[];
    table: Record<string, Pair>;
  }
}
