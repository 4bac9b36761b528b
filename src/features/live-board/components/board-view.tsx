import { useCallback, useEffect, useRef, useState, type ReactNode } from "react";
import type { TeacherLesson, TeacherTrial } from "@contracts/lessons";
import { quantityOf } from "@contracts/lesson-questions";
import { ROUND_PHASE } from "@contracts/lesson-rules";
import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ChevronDownIcon, ChevronRightIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { LoadingState } from "@/components/ui/spinner";
import { cx } from "@/lib/cx";
import { currentTrialOf, joinedCountOf, type LiveTeacherLesson } from "../api/lesson-cache";
import { useTeacherLesson, type Send, type TeacherLessonHandle } from "../api/use-teacher-lesson";
import type { BoardAction } from "../hooks/board-keys";
import { useBoardKeys } from "../hooks/use-board-keys";
import { usePlaybackController } from "../hooks/use-playback";
import { useSetupDraft } from "../hooks/use-setup-draft";
import { setupKeyOf, useTrialSimulation } from "../hooks/use-trial-simulation";
import { useTrialResult } from "../hooks/use-trial-result";
import { nextPhaseOf, runNeedsPhaseChange } from "../utils/phases";
import { setupPayload } from "@/components/trial-setup/setup-form";
import { seedForTrial } from "../utils/trial-result";
import { ConnectionStatus } from "./connection-status";
import { ExplanationList } from "./explanation-list";
import { HelpOverlay } from "./help-overlay";
import { JoinPanel } from "./join-panel";
import { LessonControls } from "./lesson-controls";
import { PhaseSteps } from "./phase-steps";
import { MeasuredReadout, PlaybackBar } from "./playback-bar";
import { RigStage, type RigStageHandle } from "./rig-stage";
import { SetupPanel } from "./setup-panel";
import { TheoryPanel } from "./theory-panel";

type BoardControlSubscribe = TeacherLessonHandle["onBoardControl"];

/** What a slot is drawn from: the lesson, the trial on show, and the teacher's commands. */
export interface SlotContext {
  lesson: TeacherLesson;
  trial: TeacherTrial;
  send: Send;
}

export interface BoardSlots {
  /**
   * The comparison graph (predictions, simulated result and theory; across trials the class's
   * results against the theory line), drawn by the route; nothing is drawn when absent.
   */
  graphPanel?: (context: SlotContext) => ReactNode;
  /** Counts from a show of hands (the tally form). */
  tallyPanel?: (context: SlotContext) => ReactNode;
}

/** The projector view of a live lesson, for its teacher (dark board theme, full screen). */
export function LessonBoard({ lessonId, graphPanel, tallyPanel }: { lessonId: string } & BoardSlots) {
  const { lesson, connection, refusal, send, onBoardControl } = useTeacherLesson(lessonId);
  return (
    <div data-theme="board" className="flex h-dvh flex-col overflow-hidden bg-paper text-ink">
      {lesson ? (
        <BoardLayout
          lesson={lesson}
          send={send}
          status={<ConnectionStatus connection={connection} />}
          graphPanel={graphPanel}
          tallyPanel={tallyPanel}
          onBoardControl={onBoardControl}
        />
      ) : refusal ? (
        <main id="main" className="mx-auto max-w-prose p-8">
          <ErrorState title="This lesson cannot be shown" error={refusal} />
        </main>
      ) : (
        <main id="main" className="p-8">
          <LoadingState label="Opening the lesson…" />
          <ConnectionStatus connection={connection} />
        </main>
      )}
    </div>
  );
}

/** The board's layout; the graph and tally slots are marked in `BoardSlots`. */
export function BoardLayout({ lesson, send, status, graphPanel, tallyPanel, onBoardControl }: {
  lesson: LiveTeacherLesson;
  send: Send;
  status: ReactNode;
  onBoardControl?: BoardControlSubscribe;
} & BoardSlots) {
  const trial = currentTrialOf(lesson);
  const [open, setOpen] = useState(true);
  const panel = { open, toggle: () => setOpen((o) => !o) };
  const trialNumber = trial ? lesson.trials.findIndex((t) => t.id === trial.id) + 1 : 0;
  return (
    <>
      <header className="flex flex-wrap items-start justify-between gap-4 border-b border-line px-[2vw] py-[1.5vh]">
        <div className="grid gap-2">
          <h1 className="text-[max(1.25rem,3.4vh)] font-bold leading-tight">
            {lesson.className}
            {trial ? <span className="font-normal text-ink-muted"> · Trial {trialNumber} of {lesson.trials.length}: {trial.rigLabel}</span> : null}
          </h1>
          {lesson.planTitle ? <p className="text-[max(0.9rem,1.8vh)] text-ink-muted">Plan: {lesson.planTitle}</p> : null}
          {trial ? <PhaseSteps phase={trial.phase} question={trial.question} /> : null}
          {status}
        </div>
        <JoinPanel code={lesson.code} joinUrl={lesson.joinUrl} joined={joinedCountOf(lesson)} />
      </header>
      {lesson.status === "ended" ? (
        <Notice tone="info" className="mx-[2vw] mt-3">
          <p>This lesson has ended. Its trials, answers and results are saved with the class.</p>
        </Notice>
      ) : null}
      <div className="flex min-h-0 flex-1">
        {trial ? (
          <TrialBoard
            key={trial.id}
            lesson={lesson}
            trial={trial}
            send={send}
            panel={panel}
            graphPanel={graphPanel}
            tallyPanel={tallyPanel}
            onBoardControl={onBoardControl}
          />
        ) : (
          <>
            <main id="main" className="flex-1 p-[2vw]">
              <p className="text-[max(1.25rem,3.2vh)]">No trial yet. Add one from the teacher’s panel.</p>
            </main>
            <TeacherAside lesson={lesson} trial={null} send={send} panel={panel} />
          </>
        )}
      </div>
    </>
  );
}

/** One trial on the board: the rig and its run, the question and counts, theory and slots. */
function TrialBoard({ lesson, trial, send, panel, graphPanel, tallyPanel, onBoardControl }: {
  lesson: LiveTeacherLesson;
  trial: TeacherTrial;
  send: Send;
  panel: PanelState;
  onBoardControl?: BoardControlSubscribe;
} & BoardSlots) {
  const setup = useSetupDraft(trial, send);
  // While setting up, draw what is typed (if it reads); afterwards the stored set-up.
  const typed = setup.editable ? setupPayload(setup.draft).payload : null;
  const simTrial = {
    id: trial.id,
    rig: typed?.rig ?? trial.rig,
    params: (typed?.params as Record<string, unknown> | undefined) ?? trial.params,
    phase: trial.phase,
    seed: seedForTrial(trial.id, trial.seed),
  };
  const sim = useTrialSimulation(simTrial);
  const current = sim.setupKey === setupKeyOf(simTrial);
  const recording = current ? sim.recording : null;
  const controller = usePlaybackController(recording);
  const result = useTrialResult(trial, recording, current, send);
  const stage = useRef<RigStageHandle>(null);
  const [help, setHelp] = useState(false);
  const [moveError, setMoveError] = useState<string | null>(null);

  useEffect(() => {
    controller.setDrawer((frame, moving) => stage.current?.draw(frame, moving));
    return () => controller.setDrawer(null);
  }, [controller, recording]);

  // The board plays the run when the trial reaches observe (from here or from the remote).
  const played = useRef(false);
  useEffect(() => {
    if (trial.phase === "observe" && recording && !played.current) {
      played.current = true;
      controller.replay();
    }
  }, [trial.phase, recording, controller]);

  const move = useCallback(
    (phase: TeacherTrial["phase"]) => send("trial:phase", { trialId: trial.id, phase }).then(() => setMoveError(null), (e: unknown) => setMoveError(e instanceof Error ? e.message : "Could not move on.")),
    [send, trial.id],
  );

  // The run is not shown before predictions close: it would give the answer away.
  const canPlay = trial.phase !== "setup" && trial.phase !== "predict";
  const onAction = (action: BoardAction) => {
    if (!canPlay && action !== "next-phase" && action !== "run" && action !== "help") return;
    switch (action) {
      case "next-phase": {
        const next = nextPhaseOf(trial.phase, trial.question);
        if (next) void move(next);
        return;
      }
      case "run":
        if (runNeedsPhaseChange(trial.phase)) void move("observe");
        else controller.replay();
        return;
      case "toggle-play":
        controller.toggle();
        return;
      case "toggle-slow":
        controller.toggleSlow();
        return;
      case "replay":
        controller.replay();
        return;
      case "back":
        controller.step(-1);
        return;
      case "forward":
        controller.step(1);
        return;
      case "help":
        setHelp((h) => !h);
    }
  };
  useBoardKeys(onAction, () => !controller.getSnapshot().playing);
  // The remote's play, speed and replay buttons arrive here as the same actions as the keys.
  const onActionRef = useRef(onAction);
  onActionRef.current = onAction;
  useEffect(() => onBoardControl?.((action) => onActionRef.current(action)), [onBoardControl]);

  const look = recording ?? sim.preview;
  const question = trial.question;
  const quantity = quantityOf(trial.rig, question.quantity);
  const round = trial.phase === "revote" ? 2 : 1;
  const collecting = trial.phase === ROUND_PHASE[1] || trial.phase === ROUND_PHASE[2];
  const shown = trial.explanations.filter((x) => x.shown);
  const afterRun = trial.phase !== "setup" && trial.phase !== "predict";
  // The theory's number would answer the question: on the projector it waits for the run unless the teacher shows it.
  const [theoryRevealed, setTheoryRevealed] = useState(false);

  return (
    <>
      <main
        id="main"
        className={cx(
          "grid min-h-0 min-w-0 flex-1 gap-[2vw] p-[2vw]",
          // Once there is a result, the graphs need as much room as the drawing.
          afterRun ? "grid-cols-[minmax(0,1fr)_minmax(0,1fr)]" : "grid-cols-[minmax(0,3fr)_minmax(0,2fr)]",
        )}
      >
        <div className="flex min-h-0 min-w-0 flex-col gap-3">
          {look ? (
            <RigStage
              ref={stage}
              scene={look.scene}
              elements={look.elements}
              frame={recording ? recording.frames[0] : sim.preview?.frame}
              moving={recording ? recording.movingShapes[0] : sim.preview?.movingShapes}
              label={`${trial.rigLabel}: ${recording ? "the recorded run" : "drawn at rest"}`}
              className="flex-1 rounded-card border border-line bg-sunken"
            />
          ) : (
            <div className="flex flex-1 items-center justify-center rounded-card border border-line bg-sunken">
              <LoadingState label="Drawing the rig…" />
            </div>
          )}
          {sim.error ? (
            <Notice tone="danger" live="alert">
              <p>The simulation stopped: {sim.error}</p>
            </Notice>
          ) : sim.progress !== null && trial.phase !== "setup" ? (
            <p role="status" className="text-[max(1rem,2.4vh)] text-ink-muted">
              Working out the run… {Math.round(sim.progress * 100)} %
            </p>
          ) : null}
          {canPlay ? (
            <PlaybackBar controller={controller} className="text-[max(1rem,2vh)]" />
          ) : (
            <p className="text-[max(1rem,2.2vh)] text-ink-muted">
              {trial.phase === "setup" ? "The rig at rest. The run is worked out once the set-up is fixed." : recording ? "The run is ready: it plays when predictions close (R)." : "The rig at rest."}
            </p>
          )}
          {result.failure ? (
            <Notice tone="danger" live="alert" actions={<Button onClick={result.retry}>Send the result again</Button>}>
              <p>The result was not saved: {result.failure}</p>
            </Notice>
          ) : null}
          {moveError ? (
            <Notice tone="danger" live="alert">
              <p>{moveError}</p>
            </Notice>
          ) : null}
        </div>
        <div className="flex min-h-0 min-w-0 flex-col gap-[2vh] overflow-y-auto pr-1 text-[max(1rem,2.4vh)]">
          <section aria-labelledby="question-title">
            <h2 id="question-title" className="sr-only">Question</h2>
            <p className="text-[max(1.4rem,3.6vh)] font-bold leading-snug">{question.prompt}</p>
            {question.kind === "number" ? (
              <p className="text-ink-muted">Answer in {question.unit || "a number (no unit)"}</p>
            ) : (
              <ol className="mt-1 grid list-[upper-alpha] gap-1 pl-8">
                {question.choices.map((c) => (
                  <li key={c.label}>{c.label}</li>
                ))}
              </ol>
            )}
          </section>
          {collecting ? (
            <p className="text-[max(1.4rem,4vh)] font-bold" aria-live="polite">
              {trial.answered[round]} answered{round === 2 ? " in the re-vote" : ""}
            </p>
          ) : null}
          {recording && trial.phase !== "setup" && trial.phase !== "predict" ? (
            <MeasuredReadout controller={controller} recording={recording} quantity={question.quantity} unit={question.unit} label={quantity?.label ?? "Measured"} />
          ) : null}
          {graphPanel ? <section aria-label="Comparison graph">{graphPanel({ lesson, trial, send })}</section> : null}
          <section aria-labelledby="params-title">
            <h2 id="params-title" className="font-bold">Set-up</h2>
            <dl className="grid grid-cols-[auto_1fr] gap-x-4">
              {trial.shownParams.map((p) => (
                <div key={p.key} className="contents">
                  <dt className="text-ink-muted">{p.label}</dt>
                  <dd className="whitespace-nowrap font-mono font-bold">
                    {p.value}
                    {p.unit ? ` ${p.unit}` : ""}
                  </dd>
                </div>
              ))}
            </dl>
          </section>
          {tallyPanel ? <section aria-label="Show of hands">{tallyPanel({ lesson, trial, send })}</section> : null}
          {shown.length > 0 ? (
            <section aria-labelledby="shown-title">
              <h2 id="shown-title" className="font-bold">Explanations from the class</h2>
              <ul className="grid gap-2">
                {shown.map((x) => (
                  <li key={x.id} className="rounded-control border-l-4 border-accent bg-surface px-3 py-2">
                    “{x.text}”
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          {afterRun || theoryRevealed ? (
            <TheoryPanel
              rig={simTrial.rig}
              params={simTrial.params}
              theory={trial.theory}
              unit={question.unit}
              coefficients={
                setup.editable
                  ? {
                      values: { theoryAlpha: setup.draft.params.theoryAlpha ?? "", theoryBeta: setup.draft.params.theoryBeta ?? "" },
                      errors: setup.errors,
                      onChange: (key, text) => setup.change((d) => ({ ...d, params: { ...d.params, [key]: text } })),
                    }
                  : undefined
              }
            />
          ) : (
            <section aria-labelledby="theory-hidden-title" className="grid gap-2 rounded-card border border-dashed border-line p-3">
              <h2 id="theory-hidden-title" className="text-[max(1.1rem,2.8vh)] font-bold">
                Theory
              </h2>
              <p className="text-ink-muted">Hidden until predictions close, so the projector does not give the answer away.</p>
              <div>
                <Button onClick={() => setTheoryRevealed(true)}>Show the theory now</Button>
              </div>
            </section>
          )}
        </div>
      </main>
      <TeacherAside lesson={lesson} trial={trial} send={send} panel={panel} onRun={() => controller.replay()}>
        <SetupPanel trial={trial} lessonId={lesson.id} setup={setup} send={send} />
      </TeacherAside>
      <HelpOverlay open={help} onClose={() => setHelp(false)} />
    </>
  );
}

interface PanelState {
  open: boolean;
  toggle: () => void;
}

/**
 * The teacher's side panel on the board (collapsible): lesson controls, the set-up, and the
 * explanations to choose from. It is on the projector too, so names show only when the teacher
 * turned them on.
 */
function TeacherAside({ lesson, trial, send, panel, onRun, children }: {
  lesson: LiveTeacherLesson;
  trial: TeacherTrial | null;
  send: Send;
  panel: PanelState;
  onRun?: () => void;
  children?: ReactNode;
}) {
  return (
    <aside aria-label="Teacher’s panel" className={cx("border-l border-line bg-surface", panel.open ? "w-[min(30rem,34vw)] shrink-0 overflow-y-auto p-4" : "w-auto p-2")}>
      <Button variant="quiet" aria-expanded={panel.open} onClick={panel.toggle} icon={panel.open ? <ChevronRightIcon /> : <ChevronDownIcon />}>
        {panel.open ? "Hide the teacher’s panel" : "Teacher’s panel"}
      </Button>
      {panel.open ? (
        <div className="mt-3 grid gap-6">
          <LessonControls lessonId={lesson.id} trial={trial} trials={lesson.trials} showNames={lesson.showNames} send={send} onRun={onRun} />
          {children}
          {trial ? (
            <section aria-labelledby="board-explanations" className="grid gap-2">
              <h2 id="board-explanations" className="text-xl font-bold">Explanations</h2>
              <ExplanationList explanations={trial.explanations} withNames={lesson.showNames} send={send} />
            </section>
          ) : null}
        </div>
      ) : null}
    </aside>
  );
}
