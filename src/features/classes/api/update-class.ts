import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ClassSummary, UpdateClassInput } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

export const updateClass = ({ classId, changes }: { classId: string; changes: UpdateClassInput }) =>
  apiRequest<ClassSummary>(`/api/classes/${encodeURIComponent(classId)}`, { method: "PATCH", body: changes });

export function useUpdateClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateClass,
    onSuccess: (updated) => {
      queryClient.setQueryData(classKeys.detail(updated.id), updated);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists() });
    },
  });
}
