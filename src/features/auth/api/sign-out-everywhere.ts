import { useMutation } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { useLeaveAfterSignOut } from "../hooks/use-leave-after-sign-out";

/** Ends every session of this person, on every device. */
export const signOutEverywhere = () => apiRequest<void>("/auth/sign-out-everywhere", { method: "POST" });

export function useSignOutEverywhere() {
  const leave = useLeaveAfterSignOut();
  return useMutation({ mutationFn: signOutEverywhere, onSuccess: () => leave("signed_out_everywhere") });
}
