import { queryOptions, useQuery } from "@tanstack/react-query";
import type { OpenLesson } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

export const getOpenLessons = (signal?: AbortSignal) => apiRequest<OpenLesson[]>("/api/lessons/open", { signal });

export const openLessonsQueryOptions = () =>
  queryOptions({ queryKey: lessonListKeys.open(), queryFn: ({ signal }) => getOpenLessons(signal) });

export const useOpenLessons = () => useQuery(openLessonsQueryOptions());
