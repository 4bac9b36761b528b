import type { ReviewTrial } from "@contracts/lesson-review";
import { TrialGraph } from "@/features/lesson-graph/components/trial-graph";
import { anonymousAnswers } from "../lesson/lesson-answers";

/**
 * The comparison graph of one reviewed trial, composed here because features never import one
 * another: the graph gets the answers without names (pupils' own and any show of hands).
 */
export function reviewGraph(trial: ReviewTrial) {
  return (
    <TrialGraph
      question={trial.question}
      quantityLabel={trial.quantityLabel}
      answers={anonymousAnswers(trial)}
      result={trial.result}
      theory={trial.theory}
      theme="light"
    />
  );
}
