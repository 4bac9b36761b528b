import { useMutation } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { useLeaveAfterSignOut } from "../hooks/use-leave-after-sign-out";

/** Ends this browser's session. Other tabs hear about it over the socket. */
export const signOut = () => apiRequest<void>("/auth/sign-out", { method: "POST" });

export function useSignOut() {
  const leave = useLeaveAfterSignOut();
  return useMutation({ mutationFn: signOut, onSuccess: () => leave("signed_out") });
}
