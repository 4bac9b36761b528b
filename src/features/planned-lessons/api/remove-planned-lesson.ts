import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { plannedLessonKeys } from "./planned-lesson-keys";

export const removePlannedLesson = (id: string) =>
  apiRequest<void>(`/api/planned-lessons/${encodeURIComponent(id)}`, { method: "DELETE" });

export function useRemovePlannedLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removePlannedLesson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: plannedLessonKeys.all }),
  });
}
