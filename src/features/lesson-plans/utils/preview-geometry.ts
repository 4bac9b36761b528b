import { perSiOf, parseTypedNumber } from "@contracts/lesson-rules";
import type { ShownValue } from "@contracts/lessons";
import { paramFieldsFor, type SetupDraft } from "@/components/trial-setup/setup-form";

/**
 * The numbers the preview draws with: each parameter as typed when it reads as a number in its
 * range, otherwise the rig's default (a half-typed value should not make the drawing jump).
 */
export function previewNumbers(setup: SetupDraft): Record<string, number> {
  const out: Record<string, number> = {};
  for (const field of paramFieldsFor(setup.rig)) {
    const typed = parseTypedNumber(setup.params[field.key] ?? "");
    out[field.key] = typed !== null && typed >= field.meta.min && typed <= field.meta.max ? typed : field.meta.default;
  }
  return out;
}

/** The fountain's theoretical rise above the rim in metres, when the question asks for the rise (or rise ÷ drop). */
export function crestRiseSi(setup: SetupDraft, theory: ShownValue | null): number | null {
  if (setup.rig !== "fountain" || !theory) return null;
  if (setup.question.quantity === "rise") {
    const per = perSiOf("m", theory.unit);
    return per ? theory.value / per : null;
  }
  if (setup.question.quantity === "riseRatio") return theory.value * previewNumbers(setup).potHeight!;
  return null;
}
