import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Invitation, InviteStaffInput } from "@contracts/invitations";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Stores the invitation and e-mails its link. */
export const inviteStaff = (input: InviteStaffInput) =>
  apiRequest<Invitation>("/api/invitations", { method: "POST", body: input });

export function useInviteStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteStaff,
    // Also after a failure: "saved but not sent" still leaves a new invitation to list.
    onSettled: () => queryClient.invalidateQueries({ queryKey: staffKeys.invitations() }),
  });
}
