import { Link } from "react-router";
import { Badge } from "@/components/ui/badge";
import { ErrorState } from "@/components/ui/error-state";
import { ClockIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useRecentLessons } from "../api/get-recent-lessons";
import { formatLessonDate } from "../utils/format-lesson-date";

/** Home's latest lessons across the teacher's classes: open ones go back to the board, ended ones to their review. */
export function RecentLessons() {
  const recent = useRecentLessons();
  return (
    <Section title="Recent lessons">
      {recent.isPending ? (
        <SkeletonList rows={3} label="Loading your recent lessons…" />
      ) : recent.isError ? (
        <ErrorState title="Could not load your recent lessons" error={recent.error} onRetry={() => void recent.refetch()} retrying={recent.isFetching} />
      ) : recent.data.length === 0 ? (
        <div className="flex items-start gap-3 rounded-control border-2 border-dashed border-line px-4 py-5">
          <ClockIcon className="mt-0.5 size-6 shrink-0 text-ink-muted" />
          <p>No lessons yet. Lessons you run are listed here, each with its review.</p>
        </div>
      ) : (
        <ul className="grid gap-2" aria-label="Recent lessons, newest first">
          {recent.data.map((lesson) => {
            const open = lesson.status === "open";
            return (
              <li key={lesson.id}>
                <Link
                  to={open ? `/lessons/${lesson.id}/board` : `/lessons/${lesson.id}/review`}
                  className="block rounded-control border border-line px-3 py-2 hover:border-accent hover:bg-sunken focus-visible:outline-2"
                >
                  <span className="flex flex-wrap items-center gap-2 font-bold">
                    {lesson.className}
                    {open ? <Badge tone="accent">Open · code {lesson.code}</Badge> : null}
                  </span>
                  <span className="block text-ink-muted">
                    {formatLessonDate(lesson.startedAt)}
                    {lesson.planTitle ? ` · ${lesson.planTitle}` : ""}
                  </span>
                  <span className="block text-ink-muted">
                    {lesson.trialsRun} trial{lesson.trialsRun === 1 ? "" : "s"} run · {lesson.participantCount} pupil
                    {lesson.participantCount === 1 ? "" : "s"} · {open ? "back to the board" : "review"}
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </Section>
  );
}
