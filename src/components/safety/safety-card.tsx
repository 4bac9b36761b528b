import { useId } from "react";
import { cx } from "@/lib/cx";
import { WarnIcon } from "../ui/icons";

/** The cautions for a real chain run, in the order a teacher sets one up. */
export const SAFETY_CAUTIONS = [
  "Rehearse the run on your own before doing it with a class.",
  "Clamp or weight the container so the chain cannot tip it or drag it off.",
  "Eye protection for everyone near the chain.",
  "Keep a clear zone around the chain’s whole path and where it lands.",
  "Hands and faces stay out of the chain’s path while it runs.",
  "Nobody leans over a stairwell or balcony, and nobody stands beneath a drop.",
  "Pupils never release a chain from height.",
] as const;

/**
 * The safety card for real demonstrations: shown wherever a teacher plans or records a real
 * run. It adds to the school's own risk assessment and never replaces it.
 */
export function SafetyCard({ className }: { className?: string }) {
  const titleId = useId();
  return (
    <section aria-labelledby={titleId} className={cx("rounded-card border-2 border-warn bg-warn-soft p-4 sm:p-6", className)}>
      <h2 id={titleId} className="flex items-center gap-2 text-xl font-bold">
        <WarnIcon className="size-6 text-warn" />
        Safety card: before a real chain run
      </h2>
      <p className="mt-3 font-bold">
        Your school’s risk assessment, your employer’s model risk assessments and your local rules come first. This card adds to
        them; it never replaces them.
      </p>
      <ul className="mt-3 grid gap-2">
        {SAFETY_CAUTIONS.map((caution) => (
          <li key={caution} className="flex items-start gap-2">
            <WarnIcon className="mt-1 size-4 text-warn" />
            <span>{caution}</span>
          </li>
        ))}
      </ul>
      <p className="mt-4 rounded-control border border-warn bg-surface px-3 py-2">
        <strong>Tall drops are for the simulation.</strong> A chain falling from a balcony, a stairwell or a high shelf is where
        real runs get dangerous: show those heights with Linkleap’s simulation instead.
      </p>
    </section>
  );
}
