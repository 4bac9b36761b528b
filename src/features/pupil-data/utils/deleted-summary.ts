import { PUPIL_DATA_KIND_LABELS, type DeletedCount } from "@contracts/retention";

/** "3 roster names", "1 roster name"; "nothing" when every count is zero. */
export function deletedSummary(deleted: readonly DeletedCount[]): string {
  const parts = deleted
    .filter((d) => d.count > 0)
    .map((d) => `${d.count} ${d.count === 1 ? PUPIL_DATA_KIND_LABELS[d.kind].one : PUPIL_DATA_KIND_LABELS[d.kind].many}`);
  return parts.length ? parts.join(", ") : "nothing";
}

export const formatDateTime = (iso: string) =>
  new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });
