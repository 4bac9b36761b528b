import { useSearchParams } from "react-router";
import type { ArchivedFilter } from "@contracts/classes";
import { archivedFilterFromParam, paramFromArchivedFilter } from "@/lib/archived-filter";

/** Which classes to show, kept in the address (`?show=archived|all`) so a reload or a shared link keeps it. */
export function useArchivedFilterParam(): [ArchivedFilter, (next: ArchivedFilter) => void] {
  const [params, setParams] = useSearchParams();
  const filter = archivedFilterFromParam(params.get("show"));
  const setFilter = (next: ArchivedFilter) => {
    const param = paramFromArchivedFilter(next);
    setParams(param ? { show: param } : {}, { replace: true });
  };
  return [filter, setFilter];
}
