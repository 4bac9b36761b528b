import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { LessonPlan, LessonPlanInput } from "@contracts/lesson-plans";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

/** Replaces the plan (title, summary, sharing and the trials in their new order); owner only. */
export const updatePlan = ({ planId, input }: { planId: string; input: LessonPlanInput }) =>
  apiRequest<LessonPlan>(`/api/lesson-plans/${encodeURIComponent(planId)}`, { method: "PUT", body: input });

export function useUpdatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePlan,
    onSuccess: (plan) => {
      queryClient.setQueryData(planKeys.detail(plan.id), plan);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
