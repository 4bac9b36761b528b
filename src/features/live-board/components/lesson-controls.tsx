import { useState } from "react";
import type { TeacherTrial } from "@contracts/lessons";
import { TRIAL_PHASE_LABELS, type TrialPhase } from "@contracts/lesson-rules";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { CONTROL_CLASSES } from "@/components/ui/field";
import { PlusIcon, WarnIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import type { Send } from "../api/use-teacher-lesson";
import { nextPhaseOf, revoteToggleOf, runNeedsPhaseChange } from "../utils/phases";

/**
 * Lesson and trial commands for the board's side panel and the remote: phases, run, a new
 * trial, names on the board, and ending the lesson (asked first).
 */
export function LessonControls({ lessonId, trial, trials = [], showNames, send, onRun, size = "md", className }: {
  lessonId: string;
  trial: TeacherTrial | null;
  /** All the lesson's trials, to show another one. */
  trials?: readonly TeacherTrial[];
  showNames: boolean;
  send: Send;
  /** Play the run on this device too (the board); the remote only moves the phase. */
  onRun?: () => void;
  size?: "md" | "lg";
  className?: string;
}) {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<unknown>(null);
  const [confirmEnd, setConfirmEnd] = useState(false);
  const [endError, setEndError] = useState<unknown>(null);

  const act = async (name: string, action: () => Promise<unknown>) => {
    setBusy(name);
    setError(null);
    try {
      await action();
    } catch (e) {
      setError(e);
    } finally {
      setBusy(null);
    }
  };
  const move = (phase: TrialPhase) => trial && act(phase, () => send("trial:phase", { trialId: trial.id, phase }));
  const next = trial ? nextPhaseOf(trial.phase, trial.question) : null;
  const revote = trial ? revoteToggleOf(trial.phase, trial.question) : null;
  // Playing again is for the board; the remote can only start the run (the board plays it).
  const canRun = trial !== null && (runNeedsPhaseChange(trial.phase) || (onRun !== undefined && trial.phase !== "revote"));

  return (
    <section aria-label="Lesson controls" className={cx("grid gap-3", className)}>
      <div className="flex flex-wrap gap-3">
        {next ? (
          <Button size={size} variant="primary" busy={busy === next} onClick={() => void move(next)} aria-keyshortcuts="N">
            Next: {TRIAL_PHASE_LABELS[next]}
          </Button>
        ) : null}
        {canRun ? (
          <Button
            size={size}
            busy={busy === "run"}
            aria-keyshortcuts="R"
            onClick={() =>
              void act("run", async () => {
                if (runNeedsPhaseChange(trial.phase)) await send("trial:phase", { trialId: trial.id, phase: "observe" });
                onRun?.();
              })
            }
          >
            {runNeedsPhaseChange(trial.phase) ? "▶ Run (closes predictions)" : "▶ Play the run again"}
          </Button>
        ) : null}
        {revote ? (
          <Button size={size} busy={busy === revote.to} onClick={() => void move(revote.to)}>
            {revote.label}
          </Button>
        ) : null}
        <Button
          size={size}
          icon={<PlusIcon />}
          busy={busy === "new"}
          onClick={() =>
            void act("new", async () => {
              const { trialId } = await send("trial:add", { lessonId, copyOf: null, setup: null });
              await send("trial:show", { lessonId, trialId });
            })
          }
        >
          New trial
        </Button>
      </div>
      {error ? (
        <Notice tone="danger" live="alert">
          <p>{errorMessage(error)}</p>
        </Notice>
      ) : null}
      {trials.length > 1 ? (
        <label className="grid gap-1.5 font-bold">
          Trial everyone sees
          <select
            className={CONTROL_CLASSES}
            value={trial?.id ?? ""}
            disabled={busy === "show"}
            onChange={(e) => {
              const trialId = e.target.value;
              void act("show", () => send("trial:show", { lessonId, trialId }));
            }}
          >
            {trials.map((t, i) => (
              <option key={t.id} value={t.id}>
                {i + 1}. {t.rigLabel} ({TRIAL_PHASE_LABELS[t.phase]})
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <div className="grid gap-1">
        <label className="flex min-h-touch items-center gap-3 font-bold">
          <input
            type="checkbox"
            className="size-6"
            checked={showNames}
            disabled={busy === "names"}
            onChange={(e) => {
              const value = e.target.checked;
              void act("names", () => send("lesson:settings", { lessonId, showNames: value }));
            }}
          />
          Show pupils’ names on the board
        </label>
        {showNames ? (
          <p className="flex items-start gap-2 font-bold text-warn">
            <WarnIcon className="mt-0.5 size-5" />
            Names are on: everyone who can see the projector will see them.
          </p>
        ) : (
          <p className="text-sm text-ink-muted">Off: the board shows no names. Turning it on puts names on the projector for the whole class to see.</p>
        )}
      </div>
      <div>
        <Button variant="danger" size={size} onClick={() => setConfirmEnd(true)}>
          End lesson
        </Button>
      </div>
      <ConfirmDialog
        open={confirmEnd}
        title="End this lesson?"
        confirmLabel="End lesson"
        tone="danger"
        busy={busy === "end"}
        error={endError}
        onCancel={() => setConfirmEnd(false)}
        onConfirm={() => {
          setEndError(null);
          setBusy("end");
          send("lesson:end", { lessonId })
            .then(() => setConfirmEnd(false))
            .catch((e: unknown) => setEndError(e))
            .finally(() => setBusy(null));
        }}
      >
        <p>Pupils can no longer join or answer. Everything so far is saved with the class.</p>
      </ConfirmDialog>
    </section>
  );
}
