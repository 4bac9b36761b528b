import type { ReactNode } from "react";
import type { LessonReview, ReviewTrial } from "@contracts/lesson-review";
import { Badge } from "@/components/ui/badge";
import { ButtonLink, buttonClasses } from "@/components/ui/button";
import { ArrowLeftIcon, LockIcon } from "@/components/ui/icons";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { lessonExportUrl } from "../api/lesson-exports";
import { formatReviewDate } from "../utils/review-date";
import { PupilsTable } from "./pupils-table";
import { TrialReview } from "./trial-review";

/**
 * The teacher's review of one lesson: per trial, then per pupil. The comparison graph comes
 * from the page (`renderGraph`), which composes it from the graph feature.
 */
export function LessonReviewView({ review, renderGraph, seriesGraph }: {
  review: LessonReview;
  renderGraph: (trial: ReviewTrial) => ReactNode;
  /** Across the lesson's trials (the app gives it for a fountain lesson; null otherwise). */
  seriesGraph?: ReactNode;
}) {
  const { lesson } = review;
  return (
    <>
      <ButtonLink to={`/classes/${lesson.classId}`} variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
        {lesson.className}
      </ButtonLink>
      <PageHeader
        className="mt-2"
        eyebrow={`Lesson review · ${lesson.className}`}
        title={formatReviewDate(lesson.startedAt)}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <span>{lesson.planTitle ? `Plan: ${lesson.planTitle}` : "No plan"}</span>
            <span>
              · {review.trials.length} trial{review.trials.length === 1 ? "" : "s"} · {review.participants.length} pupil
              {review.participants.length === 1 ? "" : "s"} took part
            </span>
            {lesson.status === "open" ? <Badge tone="accent">Still open · code {lesson.code}</Badge> : null}
          </span>
        }
        actions={
          <>
            <a href={lessonExportUrl(lesson.id, "predictions")} download className={buttonClasses("secondary")}>
              Download predictions (CSV)
            </a>
            <a href={lessonExportUrl(lesson.id, "results")} download className={buttonClasses("secondary")}>
              Download results (CSV)
            </a>
            <ButtonLink to={`/lessons/${lesson.id}/summary`} variant="primary">
              Print summary
            </ButtonLink>
          </>
        }
      />
      <p className="mb-6 flex max-w-prose items-start gap-2 text-ink-muted">
        <LockIcon className="mt-1 size-4 shrink-0" />
        Pupils’ names are shown to you only, as the lesson’s teacher. The printable summary and the results export have no names.
      </p>
      {review.trials.length === 0 ? (
        <EmptyState title="This lesson has no trials." />
      ) : (
        <div className="grid gap-6 [&>*]:min-w-0">
          {review.trials.map((t) => (
            <TrialReview key={t.id} trial={t} graph={renderGraph(t)} />
          ))}
          {seriesGraph ? (
            <Section title="Across the lesson" description="Each fountain trial's predictions and result against the pot height, with the theory line and the class's real runs.">
              {/* Clips the graph's screen-reader table (a table ignores its own overflow) on narrow screens. */}
              <div className="relative overflow-hidden">{seriesGraph}</div>
            </Section>
          ) : null}
          <Section title="Pupil by pupil" description="Each pupil’s predictions across the lesson, and how close each was to the simulated result.">
            {review.pupils.length === 0 ? <EmptyState title="No pupils joined this lesson." /> : <PupilsTable review={review} />}
          </Section>
        </div>
      )}
    </>
  );
}
