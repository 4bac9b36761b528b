import { useEffect, useRef, useState } from "react";
import type { TeacherTrial } from "@contracts/lessons";
import type { TrialRecording } from "@sim/catalog";
import type { Send } from "../api/use-teacher-lesson";
import { trialResultPayload } from "../utils/trial-result";

/**
 * Sends trial:result once per trial, when the run for the trial's fixed set-up is recorded
 * and the server has no result yet. A failure is shown and can be retried.
 */
export function useTrialResult(trial: TeacherTrial | null, recording: TrialRecording | null, recordingIsCurrent: boolean, send: Send) {
  const sent = useRef(new Set<string>());
  const [failure, setFailure] = useState<{ trialId: string; message: string } | null>(null);
  const [attempt, setAttempt] = useState(0);

  useEffect(() => {
    if (!trial || !recording || !recordingIsCurrent) return;
    if (trial.phase === "setup" || trial.measured !== null || sent.current.has(trial.id)) return;
    const trialId = trial.id;
    sent.current.add(trialId);
    send("trial:result", trialResultPayload(trialId, recording))
      .then(() => setFailure(null))
      .catch((error: unknown) => {
        // Not sent again by itself (a refusal would repeat): the teacher can retry.
        setFailure({ trialId, message: error instanceof Error ? error.message : "The result could not be saved." });
      });
  }, [trial, recording, recordingIsCurrent, send, attempt]);

  return { failure: failure && failure.trialId === trial?.id ? failure.message : null, retry: () => {
      if (trial) sent.current.delete(trial.id);
      setAttempt((n) => n + 1);
    } };
}
