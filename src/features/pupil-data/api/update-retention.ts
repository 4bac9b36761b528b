import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { RetentionSettings, UpdateRetentionInput } from "@contracts/retention";
import { apiRequest } from "@/lib/api-client";
import { pupilDataKeys } from "./pupil-data-keys";

export const updateRetention = (input: UpdateRetentionInput) =>
  apiRequest<RetentionSettings>("/api/school/retention", { method: "PUT", body: input });

export function useUpdateRetention() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRetention,
    onSuccess: (settings) => queryClient.setQueryData(pupilDataKeys.retention(), settings),
  });
}
