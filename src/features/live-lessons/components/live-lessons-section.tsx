import { useState } from "react";
import { useNavigate } from "react-router";
import type { ClassSummary } from "@contracts/classes";
import type { LessonListItem } from "@contracts/lessons";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { SelectField } from "@/components/ui/field";
import { ClockIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useClassLessons } from "../api/get-class-lessons";
import { useStartLesson, type StartSource } from "../api/start-lesson";
import { formatLessonDate } from "../utils/format-lesson-date";

/**
 * The class's live lessons: start one (straight onto the board), get back to an open one, and
 * the ended ones, newest first.
 */
export function LiveLessonsSection({ item, plans = [] }: {
  item: ClassSummary;
  /** Lesson plans the teacher can start from (their own and their department's shared ones). */
  plans?: readonly { id: string; title: string }[];
}) {
  const lessons = useClassLessons(item.id);
  const start = useStartLesson(item.id);
  const navigate = useNavigate();
  const [planId, setPlanId] = useState("");
  const owner = item.access === "owner";
  const canStart = owner && !item.archivedAt;

  const onStart = (source: StartSource = {}) =>
    start.mutate(source, { onSuccess: (started) => void navigate(`/lessons/${started.lessonId}/board`) });
  const plain = start.isPending && !start.variables?.fromLessonId && !start.variables?.planId;

  return (
    <Section
      title="Live lessons"
      description="Start a live lesson to put its board on the projector. Pupils join with the lesson code shown there. An earlier lesson's trials can be run again with the class."
      actions={
        canStart ? (
          <Button variant="primary" busy={plain} onClick={() => onStart()}>
            Start a live lesson
          </Button>
        ) : null
      }
    >
      {canStart && plans.length > 0 ? (
        <form
          className="mb-4 flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (planId) onStart({ planId });
          }}
        >
          <SelectField label="Or start from a plan" value={planId} onChange={(e) => setPlanId(e.target.value)} wrapperClassName="min-w-60 flex-1">
            <option value="">Pick a plan…</option>
            {plans.map((p) => (
              <option key={p.id} value={p.id}>
                {p.title}
              </option>
            ))}
          </SelectField>
          <Button type="submit" disabled={!planId} busy={start.isPending && Boolean(start.variables?.planId)}>
            Start from this plan
          </Button>
        </form>
      ) : null}
      {start.isError ? (
        <Notice tone="danger" className="mb-4" live="alert">
          <p>Could not start the lesson: {start.error.message}</p>
        </Notice>
      ) : null}
      {owner && item.archivedAt ? <p className="mb-4 text-ink-muted">Restore the class to start a lesson with it.</p> : null}
      {lessons.isPending ? (
        <SkeletonList rows={2} label="Loading the class’s lessons…" />
      ) : lessons.isError ? (
        <ErrorState title="Could not load the lessons" error={lessons.error} onRetry={() => void lessons.refetch()} retrying={lessons.isFetching} />
      ) : lessons.data.length === 0 ? (
        <div className="flex items-start gap-3 rounded-control border-2 border-dashed border-line px-4 py-5">
          <ClockIcon className="mt-0.5 size-6 text-ink-muted" />
          <p>No lessons with this class yet.</p>
        </div>
      ) : (
        <ul className="grid gap-3" aria-label="Lessons, newest first">
          {lessons.data.map((lesson) => (
            <LessonRow
              key={lesson.id}
              lesson={lesson}
              owner={owner}
              runAgain={canStart && lesson.status === "ended" && lesson.trialCount > 0 ? () => onStart({ fromLessonId: lesson.id }) : null}
              starting={start.isPending && start.variables?.fromLessonId === lesson.id}
            />
          ))}
        </ul>
      )}
    </Section>
  );
}

function LessonRow({ lesson, owner, runAgain, starting }: {
  lesson: LessonListItem;
  owner: boolean;
  /** Starts a new lesson with this one's trials (set-ups and questions, no answers). */
  runAgain: (() => void) | null;
  starting: boolean;
}) {
  const open = lesson.status === "open";
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 rounded-control border border-line px-4 py-3">
      <div className="min-w-0">
        <p className="font-bold">
          {formatLessonDate(lesson.startedAt)}{" "}
          {open ? <Badge tone="accent">Open · code {lesson.code}</Badge> : null}
        </p>
        <p className="text-ink-muted">
          {lesson.trialCount} trial{lesson.trialCount === 1 ? "" : "s"} · {lesson.participantCount} pupil
          {lesson.participantCount === 1 ? "" : "s"} took part
        </p>
      </div>
      {open && owner ? (
        <div className="flex flex-wrap gap-2">
          <ButtonLink to={`/lessons/${lesson.id}/board`} variant="primary">
            Open the board
          </ButtonLink>
          <ButtonLink to={`/lessons/${lesson.id}/remote`}>Remote</ButtonLink>
        </div>
      ) : runAgain ? (
        <Button busy={starting} onClick={runAgain} aria-label={`Start a new lesson with the trials of ${formatLessonDate(lesson.startedAt)}`}>
          Start again with these trials
        </Button>
      ) : null}
    </li>
  );
}
