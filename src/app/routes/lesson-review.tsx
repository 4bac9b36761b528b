import { useParams } from "react-router";
import { ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ArrowLeftIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { SkeletonList } from "@/components/ui/skeleton";
import { useLessonReview } from "@/features/lesson-review/api/get-lesson-review";
import { LessonReviewView } from "@/features/lesson-review/components/lesson-review-view";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { isApiError } from "@/lib/api-client";
import { RequireRole } from "../layouts/require-role";
import { ReviewSeriesGraph, reviewGraph } from "../review/review-graph";
import { seriesOf } from "../review/review-series";

export function Component() {
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers">
      <ReviewPage />
    </RequireRole>
  );
}

function ReviewPage() {
  const { lessonId = "" } = useParams();
  const query = useLessonReview(lessonId);
  useDocumentTitle(query.data ? `Review · ${query.data.lesson.className}` : "Lesson review");

  if (query.isPending) return <SkeletonList rows={4} label="Loading the lesson review…" />;
  if (query.isError) {
    const status = isApiError(query.error) ? query.error.status : 0;
    const refused = status === 404 || status === 403;
    return (
      <div className="max-w-prose">
        <ButtonLink to="/classes" variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
          Your classes
        </ButtonLink>
        <PageHeader title={refused ? "Lesson not found" : "Could not load the review"} className="mt-4" />
        {refused ? (
          <p className="text-lg">Only the teacher who ran a lesson can review it, since the review shows pupils’ names. Pick a lesson from one of your classes.</p>
        ) : (
          <ErrorState title="Could not load the review" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />
        )}
      </div>
    );
  }
  const series = seriesOf(query.data).trials.length > 1 ? <ReviewSeriesGraph review={query.data} /> : null;
  return <LessonReviewView review={query.data} renderGraph={reviewGraph} seriesGraph={series} />;
}
