import { useMutation } from "@tanstack/react-query";
import type { z } from "zod";
import type { updateTimeZoneInputSchema } from "@contracts/school";
import { apiRequest } from "@/lib/api-client";

type UpdateTimeZoneInput = z.input<typeof updateTimeZoneInputSchema>;

export const updateTimeZone = (input: UpdateTimeZoneInput) =>
  apiRequest<{ timeZone: string }>("/api/school/time-zone", { method: "PUT", body: input });

/** Saves the school's time zone. The session carries it, so the page refreshes that (`onSaved`). */
export const useUpdateTimeZone = () => useMutation({ mutationFn: updateTimeZone });
