import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { StaffMember, UpdateStaffRoleInput } from "@contracts/staff";
import { apiRequest } from "@/lib/api-client";
import { staffKeys } from "./staff-keys";

export const updateStaffRole = ({ staffId, role }: { staffId: string } & UpdateStaffRoleInput) =>
  apiRequest<StaffMember>(`/api/staff/${encodeURIComponent(staffId)}`, { method: "PATCH", body: { role } });

export function useUpdateStaffRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaffRole,
    onSuccess: (member) => {
      queryClient.setQueryData<StaffMember[]>(staffKeys.lists(), (list) => list?.map((m) => (m.id === member.id ? member : m)));
      return queryClient.invalidateQueries({ queryKey: staffKeys.lists() });
    },
  });
}
