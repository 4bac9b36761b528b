import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Cancels an invitation: its link stops working. */
export const cancelInvitation = (invitationId: string) =>
  apiRequest<void>(`/api/invitations/${encodeURIComponent(invitationId)}`, { method: "DELETE" });

export function useCancelInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: staffKeys.invitations() }),
  });
}
