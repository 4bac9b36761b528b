import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StartedLesson } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { plannedLessonKeys } from "./planned-lesson-keys";

/** Starts the live lesson for a planned one: its class, with its plan's trials. */
export const startPlannedLesson = (id: string) =>
  apiRequest<StartedLesson>(`/api/planned-lessons/${encodeURIComponent(id)}/start`, { method: "POST" });

export function useStartPlannedLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startPlannedLesson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: plannedLessonKeys.all }),
  });
}
