import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StartedLesson, StartLessonInput } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

/** Starts a lesson with one fountain trial, or with the trials of an earlier lesson of the teacher's. */
export const startLesson = (classId: string, fromLessonId: string | null = null) =>
  apiRequest<StartedLesson>(`/api/classes/${encodeURIComponent(classId)}/lessons`, {
    method: "POST",
    body: { showNames: false, fromLessonId } satisfies StartLessonInput,
  });

export function useStartLesson(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fromLessonId: string | null = null) => startLesson(classId, fromLessonId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}

/** Starts a lesson for any of the teacher's classes, empty or from a plan (home's quick start). */
export function useStartClassLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ classId, planId }: { classId: string; planId: string | null }) =>
      apiRequest<StartedLesson>(`/api/classes/${encodeURIComponent(classId)}/lessons`, {
        method: "POST",
        body: { showNames: false, fromLessonId: null, planId } satisfies StartLessonInput,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}
