import { queryOptions, useQuery } from "@tanstack/react-query";
import type { RecentLessonItem } from "@contracts/planned-lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

export const getRecentLessons = (signal?: AbortSignal) => apiRequest<RecentLessonItem[]>("/api/lessons/recent", { signal });

export const recentLessonsQueryOptions = () =>
  queryOptions({
    queryKey: lessonListKeys.recent(),
    queryFn: ({ signal }) => getRecentLessons(signal),
    // Coming back from the board, the lesson just taught should be listed.
    refetchOnMount: "always",
  });

export const useRecentLessons = () => useQuery(recentLessonsQueryOptions());
