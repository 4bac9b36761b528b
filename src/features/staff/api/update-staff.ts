import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StaffMember, UpdateStaffInput } from "@contracts/staff";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

/** Changes a person's role, department (`null` for none), or both; sends only what is given. */
export const updateStaff = ({ staffId, ...input }: { staffId: string } & UpdateStaffInput) =>
  apiRequest<StaffMember>(`/api/staff/${encodeURIComponent(staffId)}`, { method: "PATCH", body: input });

export function useUpdateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaff,
    onSuccess: (member) => {
      queryClient.setQueryData<StaffMember[]>(staffKeys.lists(), (list) => list?.map((m) => (m.id === member.id ? member : m)));
      return queryClient.invalidateQueries({ queryKey: staffKeys.lists() });
    },
  });
}
