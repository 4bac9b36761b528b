import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { BenchRun } from "@contracts/bench";
import type { PhotoMeasurementInput } from "@contracts/photo-measure";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

/** Sends the marks; the server computes the heights again and saves them as a run. */
export const measureBenchPhoto = ({ classId, photoId, input }: { classId: string; photoId: string; input: PhotoMeasurementInput }) =>
  apiRequest<BenchRun>(
    `/api/classes/${encodeURIComponent(classId)}/bench-photos/${encodeURIComponent(photoId)}/measurements`,
    { method: "POST", body: input },
  );

export function useMeasureBenchPhoto(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ photoId, input }: { photoId: string; input: PhotoMeasurementInput }) => measureBenchPhoto({ classId, photoId, input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.runs(classId) }),
  });
}
