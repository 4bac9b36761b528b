import { useParams } from "react-router";
import { LessonBoard } from "@/features/live-board/components/board-view";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { graphPanelFor, TallyPanel } from "../lesson/lesson-slots";

const boardGraph = graphPanelFor("board");

/** The projector view of a live lesson (full screen, dark board theme). */
export function Component() {
  const { lessonId = "" } = useParams();
  useDocumentTitle("Lesson board");
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <LessonBoard lessonId={lessonId} graphPanel={boardGraph} tallyPanel={TallyPanel} />
    </RequireRole>
  );
}
