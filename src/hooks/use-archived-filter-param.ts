import { useSearchParams } from "react-router";
import type { ArchivedFilter } from "@contracts/classes";
import { archivedFilterFromParam, paramFromArchivedFilter } from "@/lib/archived-filter";

/** Which classes to show, kept in the address (`?show=archived|all`) so a reload or a shared link keeps it. */
export function useArchivedFilterParam(): [ArchivedFilter, (next: ArchivedFilter) => void] {
  const [params, setParams] = useSearchParams();
  const filter = archivedFilterFromParam(params.get("show"));
  const setFilter = (next: ArchivedFilter) => {
    const param = paramFromArchivedFilter(next);
    // Other filters on the page (the department overview's dates) stay as they are.
    setParams(
      (current) => {
        const updated = new URLSearchParams(current);
        if (param) updated.set("show", param);
        else updated.delete("show");
        return updated;
      },
      { replace: true },
    );
  };
  return [filter, setFilter];
}
