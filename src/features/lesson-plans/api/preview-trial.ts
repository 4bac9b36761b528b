import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { PlanPreview } from "@contracts/lesson-plans";
import type { TrialSetupInput } from "@contracts/lessons";
import { apiRequest } from "@/lib/api-client";
import { planKeys } from "./plan-keys";

/** The theory value for an unsaved set-up, worked out on the server as for a live trial. */
export const previewTrial = (setup: TrialSetupInput, signal?: AbortSignal) =>
  apiRequest<PlanPreview>("/api/lesson-plans/preview", { method: "POST", body: setup, signal });

export const trialPreviewQueryOptions = (setup: TrialSetupInput) =>
  queryOptions({ queryKey: planKeys.preview(setup), queryFn: ({ signal }) => previewTrial(setup, signal), staleTime: Infinity });

/** Null set-up (the form has errors): nothing is asked; the last value stays shown while a new one loads. */
export const useTrialPreview = (setup: TrialSetupInput | null) =>
  useQuery({ ...trialPreviewQueryOptions(setup ?? ({} as TrialSetupInput)), enabled: setup !== null, placeholderData: keepPreviousData });
