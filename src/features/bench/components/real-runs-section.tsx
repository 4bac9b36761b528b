import type { ClassSummary } from "@contracts/classes";
import { TYPICAL_ALPHA, TYPICAL_BETA } from "@sim/theory";
import { SafetyCard } from "@/components/safety/safety-card";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useDeleteBenchRun } from "../api/delete-bench-run";
import { useBenchRuns } from "../api/get-bench-runs";
import { BenchGraph, THEORY_RATIO } from "./bench-graph";
import { BenchCsvUpload, BenchRunForm } from "./bench-run-form";
import { BenchTable } from "./bench-table";
import { PhotoMeasurePanel } from "./photo-measure-panel";

/**
 * "Real runs" on the class page: the class's bench data on a graph of rise against pot height
 * beside the published theory line, the same numbers as a table, and (for the class's teacher)
 * the ways to add runs, next to the safety card. Loaded lazily with its chart and drawing code.
 */
export function RealRunsSection({ item }: { item: ClassSummary }) {
  const runs = useBenchRuns(item.id);
  const remove = useDeleteBenchRun(item.id);
  const owner = item.access === "owner";
  return (
    <Section
      title="Real runs"
      description={
        <>
          The class’s own measurements of real chain fountains, against the published steady theory h2 = α/(1 − α − β)·h1 with α ={" "}
          {TYPICAL_ALPHA} and β = {TYPICAL_BETA} (h2/h1 = {THEORY_RATIO.toFixed(3)}; Biggins &amp; Warner, Proc. R. Soc. A 470:
          20130689, 2014). Bench data holds measurements only, nothing about pupils.
        </>
      }
    >
      <div className="grid gap-6">
        {runs.isPending ? <SkeletonList rows={2} label="Loading the real runs…" /> : null}
        {runs.isError ? <ErrorState title="Could not load the real runs" error={runs.error} onRetry={() => void runs.refetch()} retrying={runs.isFetching} /> : null}
        {runs.isSuccess && runs.data.length === 0 ? (
          <EmptyState title="No real runs yet">
            {owner ? "Type in a run, upload a CSV file or measure a photo below, and it appears on the graph." : "The class’s teacher has not recorded any real runs yet."}
          </EmptyState>
        ) : null}
        {runs.isSuccess && runs.data.length > 0 ? (
          <div className="grid gap-4 xl:grid-cols-2">
            <figure>
              <BenchGraph runs={runs.data} />
              <figcaption className="mt-2 text-sm text-ink-muted">Rise above the rim against pot height, in metres. Dashed line: theory.</figcaption>
            </figure>
            <BenchTable runs={runs.data} canDelete={owner} onDelete={(id) => remove.mutate(id)} deleting={remove.isPending ? remove.variables : null} />
          </div>
        ) : null}
        {owner ? (
          <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
            <div className="grid gap-8">
              <BenchRunForm classId={item.id} />
              <BenchCsvUpload classId={item.id} />
              <PhotoMeasurePanel classId={item.id} />
            </div>
            <SafetyCard className="h-fit" />
          </div>
        ) : null}
      </div>
    </Section>
  );
}

export default RealRunsSection;
