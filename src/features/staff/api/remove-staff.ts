import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StaffMember } from "@contracts/staff";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Removes a person's access; their open tabs are signed out at once. */
export const removeStaff = (staffId: string) =>
  apiRequest<void>(`/api/staff/${encodeURIComponent(staffId)}`, { method: "DELETE" });

export function useRemoveStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeStaff,
    onSuccess: (_nothing, staffId) => {
      queryClient.setQueryData<StaffMember[]>(staffKeys.lists(), (list) => list?.filter((m) => m.id !== staffId));
      return queryClient.invalidateQueries({ queryKey: staffKeys.lists() });
    },
  });
}
