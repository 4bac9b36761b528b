import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { PlanLessonInput, PlannedLessonItem } from "@contracts/planned-lessons";
import { apiRequest } from "@/lib/api-client";
import { plannedLessonKeys } from "./planned-lesson-keys";

export const planLesson = (input: PlanLessonInput) =>
  apiRequest<PlannedLessonItem>("/api/planned-lessons", { method: "POST", body: input });

export function usePlanLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: planLesson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: plannedLessonKeys.all }),
  });
}
