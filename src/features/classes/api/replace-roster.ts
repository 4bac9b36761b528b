import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { Roster, RosterInput } from "@contracts/roster";
import { apiRequest } from "@/lib/api-client";
import { classKeys } from "./class-keys";

/** Replaces the whole roster, in order, all or nothing. */
export const replaceRoster = ({ classId, names }: { classId: string; names: RosterInput["names"] }) =>
  apiRequest<Roster>(`/api/classes/${encodeURIComponent(classId)}/roster`, { method: "PUT", body: { names } });

export function useReplaceRoster() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: replaceRoster,
    onSuccess: (roster) => {
      queryClient.setQueryData(classKeys.roster(roster.classId), roster);
      // The class's pupil count changed: refresh the class itself (not the roster just set) and the lists.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: classKeys.detail(roster.classId), exact: true }),
        queryClient.invalidateQueries({ queryKey: classKeys.lists() }),
      ]);
    },
  });
}
