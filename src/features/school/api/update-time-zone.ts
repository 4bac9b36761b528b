import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import type { updateTimeZoneInputSchema } from "@contracts/school";
import { authKeys } from "@/features/auth/api/auth-keys";
import { apiRequest } from "@/lib/api-client";

type UpdateTimeZoneInput = z.input<typeof updateTimeZoneInputSchema>;

export const updateTimeZone = (input: UpdateTimeZoneInput) =>
  apiRequest<{ timeZone: string }>("/api/school/time-zone", { method: "PUT", body: input });

/** Saves the school's time zone; the session (which carries it) is fetched again. */
export function useUpdateTimeZone() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTimeZone,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.session() }),
  });
}
