import { RIG_CATALOG } from "@sim/catalog";
import { pickUpGeometry } from "@sim/chain/link-shapes";
import { fountainEnergyBudget, fountainSteady, idealAlphaBound } from "@sim/theory";

export interface FountainTheory {
  alpha: number;
  beta: number;
  potHeight: number;
  /** Closed-form rise above the top of the pile, m, and its ratio to the drop. */
  rise: number;
  riseRatio: number;
  speed: number;
  /** α for ideal stiff links of this shape picked up one at a time (an upper bound). */
  idealAlpha: number;
  /** W; null with the reason when the budget does not apply (α or β above ½). */
  budget: { released: number; kineticFlux: number; lostAtPile: number; lostAtFloor: number } | null;
  budgetProblem: string | null;
}

/**
 * The fountain's closed forms for a set-up (Biggins & Warner, Proc. R. Soc. A 470: 20130689,
 * 2014, as implemented in sim/theory), computed here so the panel follows the set-up as it is
 * typed. Null when the parameters do not parse or the theory refuses them (then `problem` says why).
 */
export function fountainTheoryFor(params: Record<string, unknown>): { theory: FountainTheory | null; problem: string | null } {
  const parsed = RIG_CATALOG.fountain.schema.safeParse(params);
  if (!parsed.success) return { theory: null, problem: "Check the set-up: some values are outside their ranges." };
  const p = parsed.data;
  try {
    const steady = fountainSteady({ potHeight: p.potHeight, alpha: p.theoryAlpha, beta: p.theoryBeta, lambda: p.lambda });
    let budget: FountainTheory["budget"] = null;
    let budgetProblem: string | null = null;
    try {
      budget = fountainEnergyBudget({ potHeight: p.potHeight, alpha: p.theoryAlpha, beta: p.theoryBeta, lambda: p.lambda });
    } catch {
      budgetProblem = "The energy budget needs α and β of at most 0.5: a pile or floor cannot give the chain energy.";
    }
    return {
      theory: {
        alpha: p.theoryAlpha,
        beta: p.theoryBeta,
        potHeight: p.potHeight,
        rise: steady.rise,
        riseRatio: steady.riseRatio,
        speed: steady.speed,
        idealAlpha: idealAlphaBound(pickUpGeometry(p)),
        budget,
        budgetProblem,
      },
      problem: null,
    };
  } catch {
    return { theory: null, problem: "The theory needs α + β below 1: lower one of them." };
  }
}
