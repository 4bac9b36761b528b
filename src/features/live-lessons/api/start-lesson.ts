import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StartedLesson, StartLessonInput } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

/** What a new lesson starts with: one fountain trial, an earlier lesson's trials, or a plan's. */
export interface StartSource {
  fromLessonId?: string | null;
  planId?: string | null;
}

/** Starts a lesson with one fountain trial, or with the trials of an earlier lesson of the teacher's, or of a plan they can see. */
export const startLesson = (classId: string, source: StartSource = {}) =>
  apiRequest<StartedLesson>(`/api/classes/${encodeURIComponent(classId)}/lessons`, {
    method: "POST",
    body: { showNames: false, fromLessonId: source.fromLessonId ?? null, planId: source.planId ?? null } satisfies StartLessonInput,
  });

export function useStartLesson(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (source: StartSource = {}) => startLesson(classId, source),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}

/** Starts a lesson for any of the teacher's classes, empty or from a plan (home's quick start). */
export function useStartClassLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ classId, planId }: { classId: string; planId: string | null }) => startLesson(classId, { planId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}
