import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { BenchRun, CreateBenchRunsInput } from "@contracts/bench";
import { apiRequest } from "@/lib/api-client";
import { benchKeys } from "./bench-keys";

/** Saves one typed run or a whole file's runs, all or nothing. */
export const createBenchRuns = ({ classId, input }: { classId: string; input: CreateBenchRunsInput }) =>
  apiRequest<BenchRun[]>(`/api/classes/${encodeURIComponent(classId)}/bench-runs`, { method: "POST", body: input });

export function useCreateBenchRuns(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBenchRunsInput) => createBenchRuns({ classId, input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.runs(classId) }),
  });
}
