import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { BenchPhoto } from "@contracts/bench";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

export function uploadBenchPhoto({ classId, file }: { classId: string; file: File }) {
  const form = new FormData();
  form.append("photo", file);
  return apiRequest<BenchPhoto>(`/api/classes/${encodeURIComponent(classId)}/bench-photos`, { method: "POST", form });
}

export function useUploadBenchPhoto(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadBenchPhoto({ classId, file }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.photos(classId) }),
  });
}
