import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

/** Deletes the photo and its file; runs measured on it stay, without the photo. */
export const deleteBenchPhoto = ({ classId, photoId }: { classId: string; photoId: string }) =>
  apiRequest<void>(`/api/classes/${encodeURIComponent(classId)}/bench-photos/${encodeURIComponent(photoId)}`, { method: "DELETE" });

export function useDeleteBenchPhoto(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => deleteBenchPhoto({ classId, photoId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.forClass(classId) }),
  });
}
