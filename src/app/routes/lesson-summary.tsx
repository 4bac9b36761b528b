import { useParams } from "react-router";
import { Button, ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ArrowLeftIcon } from "@/components/ui/icons";
import { SkeletonList } from "@/components/ui/skeleton";
import { useLessonReview } from "@/features/lesson-review/api/get-lesson-review";
import { LessonSummarySheet } from "@/features/lesson-review/components/lesson-summary-sheet";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { reviewGraph } from "../review/review-graph";

/**
 * The printable one-page summary: an A4 sheet on screen too (186 mm wide, the page less its
 * margins), so the graphs are drawn at the size they print and nothing reflows when printing.
 */
export function Component() {
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers">
      <SummaryPage />
    </RequireRole>
  );
}

function SummaryPage() {
  const { lessonId = "" } = useParams();
  const query = useLessonReview(lessonId);
  useDocumentTitle(query.data ? `Summary · ${query.data.lesson.className}` : "Lesson summary");
  return (
    <div className="min-h-dvh bg-sunken py-6 print:min-h-0 print:bg-paper print:py-0">
      <div className="mx-auto mb-4 flex w-[186mm] max-w-full flex-wrap items-center justify-between gap-3 print:hidden">
        <ButtonLink to={`/lessons/${lessonId}/review`} variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
          Back to the review
        </ButtonLink>
        <Button variant="primary" onClick={() => window.print()} disabled={!query.data}>
          Print
        </Button>
      </div>
      <main className="mx-auto w-[186mm] max-w-full bg-paper p-[6mm] shadow-card print:p-0 print:shadow-none">
        {query.isPending ? (
          <SkeletonList rows={3} label="Loading the summary…" />
        ) : query.isError ? (
          <ErrorState title="Could not load the summary" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />
        ) : (
          <LessonSummarySheet review={query.data} renderGraph={reviewGraph} />
        )}
      </main>
    </div>
  );
}
