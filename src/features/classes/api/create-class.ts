import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ClassSummary, CreateClassInput } from "@contracts/classes";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

export const createClass = (input: CreateClassInput) =>
  apiRequest<ClassSummary>("/api/classes", { method: "POST", body: input });

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClass,
    onSuccess: (created) => {
      queryClient.setQueryData(classKeys.detail(created.id), created);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists() });
    },
  });
}
