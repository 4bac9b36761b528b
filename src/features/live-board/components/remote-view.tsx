import { useState } from "react";
import type { BoardControl } from "@contracts/lesson-rules";
import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { Notice } from "@/components/ui/notice";
import { LoadingState } from "@/components/ui/spinner";
import { currentTrialOf, joinedCountOf } from "../api/lesson-cache";
import { useTeacherLesson } from "../api/use-teacher-lesson";
import { useSetupDraft } from "../hooks/use-setup-draft";
import type { TeacherTrial } from "@contracts/lessons";
import type { Send } from "../api/use-teacher-lesson";
import { ConnectionStatus } from "./connection-status";
import { ExplanationList } from "./explanation-list";
import { LessonControls } from "./lesson-controls";
import { PhaseSteps } from "./phase-steps";
import { SetupPanel } from "./setup-panel";
import type { BoardSlots } from "./board-view";

/**
 * The teacher's remote (phone or tablet, light theme): the same commands as the board's panel
 * without the drawing. Run moves the trial to observe; the board sees that and plays the run.
 */
export function LessonRemote({ lessonId, tallyPanel }: { lessonId: string; tallyPanel?: BoardSlots["tallyPanel"] }) {
  const { lesson, connection, refusal, send } = useTeacherLesson(lessonId);
  if (!lesson) {
    return refusal ? <ErrorState title="This lesson cannot be shown" error={refusal} /> : (
      <>
        <LoadingState label="Opening the lesson…" />
        <ConnectionStatus connection={connection} />
      </>
    );
  }
  const trial = currentTrialOf(lesson);
  return (
    <div className="mx-auto grid max-w-prose gap-6 px-4 py-4">
      <header className="grid gap-2">
        <h1 className="text-2xl font-bold">{lesson.className}: remote</h1>
        {lesson.planTitle ? <p className="text-ink-muted">Plan: {lesson.planTitle}</p> : null}
        <p>
          Code <span className="font-mono text-xl font-bold tracking-widest">{lesson.code}</span> · {joinedCountOf(lesson)} joined
        </p>
        <ConnectionStatus connection={connection} />
        {trial ? <PhaseSteps phase={trial.phase} question={trial.question} size="remote" /> : null}
      </header>
      {lesson.status === "ended" ? (
        <Notice tone="info">
          <p>This lesson has ended.</p>
        </Notice>
      ) : null}
      {trial ? (
        <p className="text-lg">
          <span className="font-bold">{trial.question.prompt}</span>
          {trial.phase === "predict" || trial.phase === "revote" ? <span className="block">{trial.answered[trial.phase === "revote" ? 2 : 1]} answered</span> : null}
        </p>
      ) : null}
      <LessonControls lessonId={lesson.id} trial={trial} trials={lesson.trials} showNames={lesson.showNames} send={send} size="lg" />
      {trial ? <RemoteTrial key={trial.id} lessonId={lesson.id} trial={trial} send={send} /> : null}
      {tallyPanel && trial ? <section aria-label="Show of hands">{tallyPanel({ lesson, trial, send })}</section> : null}
    </div>
  );
}

function RemoteTrial({ lessonId, trial, send }: { lessonId: string; trial: TeacherTrial; send: Send }) {
  const setup = useSetupDraft(trial, send);
  const afterRun = trial.phase !== "setup" && trial.phase !== "predict";
  return (
    <>
      {afterRun ? <BoardPlayback lessonId={lessonId} send={send} /> : null}
      <SetupPanel trial={trial} lessonId={lessonId} setup={setup} send={send} />
      <section aria-labelledby="remote-explanations" className="grid gap-2">
        <h2 id="remote-explanations" className="text-xl font-bold">Explanations</h2>
        <p className="text-sm text-ink-muted">Names are shown here on your device only. The board shows the text without names.</p>
        <ExplanationList explanations={trial.explanations} withNames send={send} />
      </section>
    </>
  );
}

const PLAYBACK_BUTTONS: { action: BoardControl; label: string }[] = [
  { action: "toggle-play", label: "Play or pause" },
  { action: "toggle-slow", label: "Slow motion on or off" },
  { action: "replay", label: "Replay from the start" },
];

/** The board's player, worked from the remote: the board plays the run, the remote only asks. */
function BoardPlayback({ lessonId, send }: { lessonId: string; send: Send }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState<BoardControl | null>(null);
  const ask = (action: BoardControl) => {
    setBusy(action);
    send("board:control", { lessonId, action })
      .then(() => setError(null), (e: unknown) => setError(e instanceof Error ? e.message : "The board did not get that."))
      .finally(() => setBusy(null));
  };
  return (
    <section aria-labelledby="remote-playback" className="grid gap-2">
      <h2 id="remote-playback" className="text-xl font-bold">The run on the board</h2>
      <div className="flex flex-wrap gap-3">
        {PLAYBACK_BUTTONS.map(({ action, label }) => (
          <Button key={action} size="lg" busy={busy === action} onClick={() => ask(action)}>
            {label}
          </Button>
        ))}
      </div>
      {error ? (
        <Notice tone="danger" live="alert">
          <p>{error}</p>
        </Notice>
      ) : null}
    </section>
  );
}
