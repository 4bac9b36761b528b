import type { ArchivedFilter } from "@contracts/classes";
import { ARCHIVED_FILTER_OPTIONS } from "@/lib/archived-filter";
import { ChoiceBar } from "./choice-bar";

/** Current / Archived / All, above a list of classes. */
export function ArchivedFilterBar({ value, onChange }: { value: ArchivedFilter; onChange: (next: ArchivedFilter) => void }) {
  return (
    <div className="mb-5">
      <ChoiceBar legend="Which classes to show" visibleLegend="Show" options={ARCHIVED_FILTER_OPTIONS} value={value} onChange={onChange} />
    </div>
  );
}
