import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

export const deleteBenchRun = ({ classId, runId }: { classId: string; runId: string }) =>
  apiRequest<void>(`/api/classes/${encodeURIComponent(classId)}/bench-runs/${encodeURIComponent(runId)}`, { method: "DELETE" });

export function useDeleteBenchRun(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (runId: string) => deleteBenchRun({ classId, runId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.runs(classId) }),
  });
}
