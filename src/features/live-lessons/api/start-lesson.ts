import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StartedLesson } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { lessonListKeys } from "./lesson-keys";

export const startLesson = (classId: string) =>
  apiRequest<StartedLesson>(`/api/classes/${encodeURIComponent(classId)}/lessons`, { method: "POST", body: { showNames: false } });

export function useStartLesson(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startLesson(classId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: lessonListKeys.all }),
  });
}
