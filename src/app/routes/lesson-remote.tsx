import { useParams } from "react-router";
import { LessonRemote } from "@/features/live-board/components/remote-view";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { TallyPanel } from "../lesson/lesson-slots";

/** The teacher's remote for a live lesson (phone first, light theme). */
export function Component() {
  const { lessonId = "" } = useParams();
  useDocumentTitle("Lesson remote");
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <main id="main" tabIndex={-1} className="min-h-dvh focus:outline-none">
        <LessonRemote lessonId={lessonId} tallyPanel={TallyPanel} />
      </main>
    </RequireRole>
  );
}
