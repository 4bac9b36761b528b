import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { LessonPlan } from "@contracts/lesson-plans";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

/** A copy owned by the caller, not shared, titled "… (copy)". */
export const duplicatePlan = (planId: string) =>
  apiRequest<LessonPlan>(`/api/lesson-plans/${encodeURIComponent(planId)}/duplicate`, { method: "POST" });

export function useDuplicatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicatePlan,
    onSuccess: (plan) => {
      queryClient.setQueryData(planKeys.detail(plan.id), plan);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
