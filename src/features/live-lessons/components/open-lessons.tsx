import { ButtonLink } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useOpenLessons } from "../api/get-open-lessons";
import { formatLessonDate } from "../utils/format-lesson-date";

/** On the teacher's home page: lessons still open, one click back to their board. Shows nothing when none are. */
export function OpenLessons() {
  const open = useOpenLessons();
  if (!open.data || open.data.length === 0) return null;
  return (
    <Notice tone="info" className="mb-6">
      <p className="font-bold">{open.data.length === 1 ? "A live lesson is still open" : "Live lessons are still open"}</p>
      <ul className="mt-2 grid gap-2">
        {open.data.map((lesson) => (
          <li key={lesson.id} className="flex flex-wrap items-center gap-3">
            <span>
              {lesson.className}, started {formatLessonDate(lesson.startedAt)} (code {lesson.code})
            </span>
            <ButtonLink to={`/lessons/${lesson.id}/board`} variant="primary">
              Back to the board
            </ButtonLink>
            <ButtonLink to={`/lessons/${lesson.id}/remote`}>Remote</ButtonLink>
          </li>
        ))}
      </ul>
    </Notice>
  );
}
