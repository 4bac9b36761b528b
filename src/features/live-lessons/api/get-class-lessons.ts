import { queryOptions, useQuery } from "@tanstack/react-query";
import type { LessonListItem } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

export const getClassLessons = (classId: string, signal?: AbortSignal) =>
  apiRequest<LessonListItem[]>(`/api/classes/${encodeURIComponent(classId)}/lessons`, { signal });

export const classLessonsQueryOptions = (classId: string) =>
  queryOptions({ queryKey: lessonListKeys.forClass(classId), queryFn: ({ signal }) => getClassLessons(classId, signal) });

export const useClassLessons = (classId: string) => useQuery(classLessonsQueryOptions(classId));
