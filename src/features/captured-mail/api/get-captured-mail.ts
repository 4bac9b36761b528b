import { queryOptions, useQuery } from "@tanstack/react-query";
import type { CapturedMail } from "@contracts/captured-mail";
import { apiRequest } from "@/lib/api-client";
import { capturedMailKeys } from "./captured-mail-keys";

/** Messages the demo's local SMTP server caught, newest first (school admins, demo mode only). */
export const getCapturedMail = (signal?: AbortSignal) => apiRequest<CapturedMail[]>("/api/dev/mail", { signal });

export const capturedMailQueryOptions = () =>
  queryOptions({
    queryKey: capturedMailKeys.list(),
    queryFn: ({ signal }) => getCapturedMail(signal),
    staleTime: 0,
  });

export const useCapturedMail = () => useQuery(capturedMailQueryOptions());
