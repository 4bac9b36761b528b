import { quantityOf } from "../contracts/lesson-questions";
import { perSiOf } from "../contracts/lesson-rules";
import type { ShownValue, TrialSetup } from "../contracts/lessons";
import { theoryFor } from "./lessons.service";

/**
 * The fountain's theory does not depend on how many links the chain has (only on the drop, α, β,
 * λ and the link's shape; checked in setup-theory.test.ts), so plans and trials not yet run work it out on the
 * shortest chain the rig allows: building 1000 links costs 70–150 ms a trial, 100 links a few ms.
 */
export const THEORY_LINKS = 100;
export const theoryParams = (setup: Pick<TrialSetup, "rig" | "params">) =>
  setup.rig === "fountain" ? { ...setup.params, links: THEORY_LINKS } : setup.params;

/**
 * The closed-form value for a set-up in the question's unit, as the board shows it (the theory
 * is worked out by the rig itself, the same as for a live trial; cached per set-up).
 */
export function theoryInQuestionUnit(setup: Pick<TrialSetup, "rig" | "params" | "question">): ShownValue | null {
  const quantity = quantityOf(setup.rig, setup.question.quantity);
  const per = quantity ? perSiOf(quantity.siUnit, setup.question.unit) : null;
  if (!quantity || per === null) return null;
  let si: number | undefined;
  try {
    si = theoryFor(setup.rig, theoryParams(setup), 1)[setup.question.quantity];
  } catch {
    return null;
  }
  return si === undefined || !Number.isFinite(si) ? null : { value: si * per, uncertainty: null, unit: setup.question.unit };
}
