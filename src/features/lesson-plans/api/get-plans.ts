import { queryOptions, useQuery } from "@tanstack/react-query";
import type { LessonPlanListItem } from "@contracts/lesson-plans";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

/** The teacher's own plans and those shared in their department, most recently changed first. */
export const getPlans = (signal?: AbortSignal) => apiRequest<LessonPlanListItem[]>("/api/lesson-plans", { signal });

export const plansQueryOptions = () => queryOptions({ queryKey: planKeys.lists(), queryFn: ({ signal }) => getPlans(signal) });

export const usePlans = () => useQuery(plansQueryOptions());
