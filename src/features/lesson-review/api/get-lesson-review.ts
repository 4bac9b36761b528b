import { queryOptions, useQuery } from "@tanstack/react-query";
import type { LessonReview } from "@contracts/lesson-review";
import { apiRequest } from "@/lib/api-client";
import { reviewKeys } from "./review-keys";

export const getLessonReview = (lessonId: string, signal?: AbortSignal) =>
  apiRequest<LessonReview>(`/api/lessons/${encodeURIComponent(lessonId)}/review`, { signal });

export const lessonReviewQueryOptions = (lessonId: string) =>
  queryOptions({ queryKey: reviewKeys.lesson(lessonId), queryFn: ({ signal }) => getLessonReview(lessonId, signal) });

export const useLessonReview = (lessonId: string) => useQuery(lessonReviewQueryOptions(lessonId));
