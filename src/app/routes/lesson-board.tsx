import { useParams } from "react-router";
import { LessonBoard } from "@/features/live-board/components/board-view";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";

/** The projector view of a live lesson (full screen, dark board theme). */
export function Component() {
  const { lessonId = "" } = useParams();
  useDocumentTitle("Lesson board");
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      {/* graphPanel and tallyPanel: slots for the comparison graph and the show-of-hands form. */}
      <LessonBoard lessonId={lessonId} graphPanel={undefined} tallyPanel={undefined} />
    </RequireRole>
  );
}
