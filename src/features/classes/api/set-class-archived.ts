import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ClassSummary } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

/** `POST /api/classes/:id/archive` or `/restore`: both answer with the class as it is now. */
export const setClassArchived = ({ classId, archived }: { classId: string; archived: boolean }) =>
  apiRequest<ClassSummary>(`/api/classes/${encodeURIComponent(classId)}/${archived ? "archive" : "restore"}`, {
    method: "POST",
  });

export function useSetClassArchived() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setClassArchived,
    onSuccess: (updated) => {
      queryClient.setQueryData(classKeys.detail(updated.id), updated);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists() });
    },
  });
}
