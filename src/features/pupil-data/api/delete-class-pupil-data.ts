import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { PupilDataDeletion } from "@contracts/retention";
import { apiRequest } from "@/lib/api-client";
import { pupilDataKeys } from "./pupil-data-keys";

/** Deletes every kind of pupil data the class holds, now. */
export const deleteClassPupilData = (classId: string) =>
  apiRequest<PupilDataDeletion>(`/api/classes/${encodeURIComponent(classId)}/pupil-data`, { method: "DELETE" });

export function useDeleteClassPupilData() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteClassPupilData,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pupilDataKeys.schoolClasses() }),
  });
}
