import type { LessonPlan } from "@contracts/lesson-plans";
import { draftFromSetup } from "@/components/trial-setup/setup-form";
import { Badge } from "@/components/ui/badge";
import { crestRiseSi } from "../utils/preview-geometry";
import { RigPreview } from "./rig-preview";
import { TheoryValue } from "./theory-value";

/** A plan read-only (a colleague's shared plan): the summary and each trial's set-up, question and theory. */
export function PlanView({ plan }: { plan: LessonPlan }) {
  return (
    <div className="grid gap-6">
      {plan.summary ? <p className="max-w-prose whitespace-pre-line text-lg">{plan.summary}</p> : null}
      <ol className="grid gap-4" aria-label="Trials, in the order they will run">
        {plan.trials.map((trial, i) => {
          const setup = draftFromSetup({ rig: trial.rig, params: trial.params, question: trial.question });
          return (
            <li key={i} className="grid gap-4 rounded-card border border-line bg-surface p-4 shadow-card sm:p-6 lg:grid-cols-2" data-testid="plan-trial">
              <div className="grid content-start gap-3">
                <h3 className="text-lg font-bold">
                  Trial {i + 1} of {plan.trials.length}: {trial.rigLabel}
                </h3>
                <ul className="grid gap-1">
                  {trial.shownParams
                    .filter((p) => !["looseRows", "aspectRatio"].includes(p.key))
                    .map((p) => (
                      <li key={p.key}>
                        {p.label}: <span className="font-mono font-bold">{p.value}{p.unit ? ` ${p.unit}` : ""}</span>
                      </li>
                    ))}
                </ul>
                <p>
                  <span className="font-bold">Question:</span> {trial.question.prompt}
                  {trial.question.kind === "number" ? ` (a number${trial.question.unit ? ` in ${trial.question.unit}` : ""})` : ""}
                </p>
                {trial.question.kind === "choice" ? (
                  <ul className="ml-5 list-disc">
                    {trial.question.choices.map((c, j) => (
                      <li key={j}>{c.label}</li>
                    ))}
                  </ul>
                ) : null}
                <p className="flex flex-wrap gap-2">
                  {trial.question.askReason ? <Badge>Reason asked</Badge> : null}
                  {trial.question.askExplanation ? <Badge>Explanation asked</Badge> : null}
                  {trial.question.revote ? <Badge>Re-vote offered</Badge> : null}
                </p>
                <TheoryValue theory={trial.theory} />
              </div>
              <RigPreview setup={setup} theory={trial.theory} theorySi={crestRiseSi(setup, trial.theory)} />
            </li>
          );
        })}
      </ol>
    </div>
  );
}
