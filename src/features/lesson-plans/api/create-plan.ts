import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { LessonPlan, LessonPlanInput } from "@contracts/lesson-plans";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

export const createPlan = (input: LessonPlanInput) => apiRequest<LessonPlan>("/api/lesson-plans", { method: "POST", body: input });

export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: (plan) => {
      queryClient.setQueryData(planKeys.detail(plan.id), plan);
      return queryClient.invalidateQueries({ queryKey: planKeys.lists() });
    },
  });
}
