import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

export const endLesson = (lessonId: string) =>
  apiRequest<{ lessonId: string }>(`/api/lessons/${encodeURIComponent(lessonId)}/end`, { method: "POST" });

export function useEndLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: endLesson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}
