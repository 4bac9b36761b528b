import type { ClassSummary } from "@contracts/classes";
import { ErrorState } from "@/components/ui/error-state";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useRoster } from "../api/get-roster";
import { rosterCountLabel } from "../utils/class-form";
import { RosterEditor } from "./roster-editor";
import { RosterView } from "./roster-view";

/** The class roster: an editor for the class's teacher, a list for the head of department. */
export function RosterSection({ item, onDirtyChange }: { item: ClassSummary; onDirtyChange?: (dirty: boolean) => void }) {
  const roster = useRoster(item.id);
  const editable = item.access === "owner";
  return (
    <Section
      title="Roster"
      description={
        editable
          ? "Optional. The pupils' display names for this class, in the order you want them listed."
          : rosterCountLabel(item.rosterCount)
      }
    >
      {roster.isPending ? (
        <SkeletonList rows={3} label="Loading the roster…" />
      ) : roster.isError ? (
        <ErrorState title="Could not load the roster" error={roster.error} onRetry={() => void roster.refetch()} retrying={roster.isFetching} />
      ) : editable ? (
        <RosterEditor classId={item.id} roster={roster.data} onDirtyChange={onDirtyChange} />
      ) : (
        <RosterView roster={roster.data} />
      )}
    </Section>
  );
}
