import { queryOptions, useQuery } from "@tanstack/react-query";
import type { LessonPlan } from "@contracts/lesson-plans";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

export const getPlan = (planId: string, signal?: AbortSignal) =>
  apiRequest<LessonPlan>(`/api/lesson-plans/${encodeURIComponent(planId)}`, { signal });

export const planQueryOptions = (planId: string) =>
  queryOptions({ queryKey: planKeys.detail(planId), queryFn: ({ signal }) => getPlan(planId, signal) });

export const usePlan = (planId: string | null) => useQuery({ ...planQueryOptions(planId ?? ""), enabled: planId !== null });
