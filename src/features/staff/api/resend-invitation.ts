import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Invitation } from "@contracts/invitations";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Sends the invitation again with a new link and a new expiry date; the old link stops working. */
export const resendInvitation = (invitationId: string) =>
  apiRequest<Invitation>(`/api/invitations/${encodeURIComponent(invitationId)}/resend`, { method: "POST" });

export function useResendInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: staffKeys.invitations() }),
  });
}
