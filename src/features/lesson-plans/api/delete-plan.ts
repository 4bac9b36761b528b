import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

export const deletePlan = (planId: string) => apiRequest<void>(`/api/lesson-plans/${encodeURIComponent(planId)}`, { method: "DELETE" });

export function useDeletePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePlan,
    onSuccess: (_done, planId) => {
      queryClient.removeQueries({ queryKey: planKeys.detail(planId) });
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
