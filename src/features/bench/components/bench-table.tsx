import type { BenchRun } from "@contracts/bench";
import { METRES_PER } from "@contracts/bench";
import { Button } from "@/components/ui/button";
import { SOURCE_STYLE, THEORY_RATIO } from "./bench-graph";

const inUnit = (metres: number, unit: BenchRun["heightUnit"], figures = 4) => `${Number((metres / METRES_PER[unit]).toPrecision(figures))} ${unit}`;
const SHAPE_WORD = { circle: "●", rect: "■", triangle: "▲" } as const;

/** The graph's numbers as a table: what a screen reader reads, and what anyone can check. */
export function BenchTable({ runs, canDelete, onDelete, deleting }: {
  runs: BenchRun[];
  canDelete: boolean;
  onDelete: (runId: string) => void;
  deleting?: string | null;
}) {
  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="w-full min-w-[36rem] text-left" data-testid="bench-table">
        <caption className="sr-only">The class’s real runs, with the theory’s rise for each pot height</caption>
        <thead className="bg-sunken text-sm">
          <tr>
            <th scope="col" className="px-3 py-2">Source</th>
            <th scope="col" className="px-3 py-2">Pot height h1</th>
            <th scope="col" className="px-3 py-2">Rise h2</th>
            <th scope="col" className="px-3 py-2">Theory h2</th>
            <th scope="col" className="px-3 py-2">Chain speed</th>
            <th scope="col" className="px-3 py-2">Note</th>
            {canDelete ? <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th> : null}
          </tr>
        </thead>
        <tbody>
          {runs.map((run) => (
            <tr key={run.id} className="border-t border-line align-top" data-run-id={run.id}>
              <td className="px-3 py-2">
                <span aria-hidden="true">{SHAPE_WORD[SOURCE_STYLE[run.source].shape]} </span>
                {run.source === "photo" ? (run.photoId ? "Photo" : "Photo (since deleted)") : run.source === "csv" ? "CSV file" : "Typed"}
              </td>
              <td className="whitespace-nowrap px-3 py-2 font-mono">{inUnit(run.potHeightM, run.heightUnit)}</td>
              <td className="whitespace-nowrap px-3 py-2 font-mono">{inUnit(run.riseM, run.heightUnit)}</td>
              {/* Three figures: the theory is no more certain than α itself. */}
              <td className="whitespace-nowrap px-3 py-2 font-mono text-ink-muted">{inUnit(THEORY_RATIO * run.potHeightM, run.heightUnit, 3)}</td>
              <td className="whitespace-nowrap px-3 py-2 font-mono">{run.speedMps === null ? "—" : `${run.speedMps} m/s`}</td>
              <td className="min-w-48 px-3 py-2 [overflow-wrap:anywhere]">{run.note}</td>
              {canDelete ? (
                <td className="px-3 py-2">
                  <Button variant="quiet" busy={deleting === run.id} onClick={() => onDelete(run.id)} aria-label={`Delete the run with pot height ${inUnit(run.potHeightM, run.heightUnit)}`}>
                    Delete
                  </Button>
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
