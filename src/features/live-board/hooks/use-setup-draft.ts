import { useCallback, useEffect, useRef, useState } from "react";
import type { TeacherTrial } from "@contracts/lessons";
import { isApiError } from "@/lib/api-client";
import type { Send } from "../api/use-teacher-lesson";
import { draftFromSetup, fieldMessages, setupPayload, type SetupDraft } from "@/components/trial-setup/setup-form";

export interface SetupDraftHandle {
  draft: SetupDraft;
  /** Change the form; sent with trial:setup ~300 ms after the last change. */
  change: (update: (draft: SetupDraft) => SetupDraft) => void;
  errors: Record<string, string>;
  status: "saved" | "saving" | "failed";
  /** The form's own problem (not tied to a field). */
  problem: string | null;
  editable: boolean;
}

const SEND_DELAY_MS = 300;

/**
 * The set-up form of the current trial, shared by the set-up panel and the theory panel's α
 * and β. Edits are sent debounced; the server's view replaces the form only while nothing
 * typed here is waiting to be sent (so the board follows changes made on the remote).
 */
export function useSetupDraft(trial: TeacherTrial, send: Send): SetupDraftHandle {
  const fromTrial = useCallback(() => draftFromSetup({ rig: trial.rig, params: trial.params, question: trial.question }), [trial.rig, trial.params, trial.question]);
  const [draft, setDraftState] = useState<SetupDraft>(fromTrial);
  const draftRef = useRef(draft);
  const setDraft = (next: SetupDraft) => {
    draftRef.current = next;
    setDraftState(next);
  };
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<SetupDraftHandle["status"]>("saved");
  const [problem, setProblem] = useState<string | null>(null);
  const dirty = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const trialId = trial.id;

  // Another trial: start again from its set-up.
  useEffect(() => {
    dirty.current = false;
    setErrors({});
    setProblem(null);
    setStatus("saved");
    setDraft(fromTrial());
    // Only on a new trial; the next effect follows the server's changes to this one.
  }, [trialId]);

  useEffect(() => {
    if (!dirty.current) setDraft(fromTrial());
  }, [fromTrial]);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  const change = useCallback(
    (update: (draft: SetupDraft) => SetupDraft) => {
      {
        const next = update(draftRef.current);
        setDraft(next);
        dirty.current = true;
        if (timer.current) clearTimeout(timer.current);
        timer.current = setTimeout(() => {
          const { payload, errors: local } = setupPayload(next);
          setErrors(local);
          if (!payload) {
            setStatus("failed");
            return;
          }
          setStatus("saving");
          send("trial:setup", { ...payload, trialId })
            .then(() => {
              dirty.current = false;
              setStatus("saved");
              setProblem(null);
            })
            .catch((error: unknown) => {
              setStatus("failed");
              if (isApiError(error) && Object.keys(error.fields).length > 0) setErrors(fieldMessages(error.fields));
              setProblem(isApiError(error) ? error.message : "The set-up could not be saved.");
            });
        }, SEND_DELAY_MS);
      }
    },
    [send, trialId],
  );

  return { draft, change, errors, status, problem, editable: trial.phase === "setup" };
}
