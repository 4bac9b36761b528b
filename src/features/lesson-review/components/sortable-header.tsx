import type { SortState } from "../utils/review-table";

/**
 * A column header that sorts its table: a real button inside the th (reachable and pressed
 * with the keyboard), and aria-sort on the sorted column only, as the ARIA sortable-table
 * pattern has it. The arrow is drawn as text beside the words, never colour alone.
 */
export function SortableHeader<K extends string>({ column, label, sort, onSort, className }: {
  column: K;
  label: string;
  sort: SortState<K> | null;
  onSort: (column: K) => void;
  className?: string;
}) {
  const active = sort?.key === column;
  return (
    <th scope="col" aria-sort={active ? sort.direction : undefined} className={className ?? "px-1 py-1"}>
      <button
        type="button"
        onClick={() => onSort(column)}
        className="inline-flex min-h-touch w-full items-center gap-1 rounded-control px-2 text-left font-bold hover:bg-accent-soft"
      >
        {label}
        <span aria-hidden="true" className="font-mono text-ink-muted">
          {active ? (sort.direction === "ascending" ? "▲" : "▼") : "↕"}
        </span>
      </button>
    </th>
  );
}
