import { useCallback } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { useNavigate } from "react-router";
import type { AppNavigationState, SignedOutReason } from "@/lib/navigation-state";

/**
 * After a session ends (here, in another tab, or on another device): forget every cached answer,
 * since it belonged to the person who was signed in, and go to the sign-in page with a message.
 */
export function useLeaveAfterSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useCallback(
    (reason: SignedOutReason) => {
      const state: AppNavigationState = { signedOut: reason, leaveUnsaved: true };
      void navigate("/sign-in", { replace: true, state });
      queryClient.clear();
    },
    [navigate, queryClient],
  );
}
