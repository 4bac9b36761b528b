import { queryOptions, useQuery } from "@tanstack/react-query";
import type { PlannedLessonItem } from "@contracts/planned-lessons";
import { apiRequest } from "@/lib/api-client";
import { plannedLessonKeys } from "./planned-lesson-keys";

/** The teacher's planned lessons not yet started, soonest first. */
export const getPlannedLessons = (signal?: AbortSignal) => apiRequest<PlannedLessonItem[]>("/api/planned-lessons", { signal });

export const plannedLessonsQueryOptions = () =>
  queryOptions({ queryKey: plannedLessonKeys.upcoming(), queryFn: ({ signal }) => getPlannedLessons(signal) });

export const usePlannedLessons = () => useQuery(plannedLessonsQueryOptions());
