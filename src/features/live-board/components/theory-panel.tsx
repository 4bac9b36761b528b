import type { ShownValue } from "@contracts/lessons";
import { RIG_CATALOG, type RigId } from "@sim/catalog";
import { CALIBRATED_PILE_NOTE, TYPICAL_ALPHA_NOTE } from "@sim/theory";
import { TextField } from "@/components/ui/field";
import { cx } from "@/lib/cx";
import { perSi, threeFigures, withUncertainty } from "../utils/readout";
import { fountainTheoryFor } from "../utils/theory-figures";

interface TheoryPanelProps {
  rig: RigId;
  /** The set-up's parameters (as the server holds them, or as typed). */
  params: Record<string, unknown>;
  /** The server's closed-form value in the question's unit, for rigs without a panel of their own. */
  theory: ShownValue | null;
  /** The question's unit, for the fountain's rise. */
  unit: string;
  /** α and β as typed, their messages, and a way to change them; only while setting up. */
  coefficients?: {
    values: { theoryAlpha: string; theoryBeta: string };
    errors: Record<string, string | undefined>;
    onChange: (key: "theoryAlpha" | "theoryBeta", text: string) => void;
  };
  className?: string;
}

const watts = (w: number) => `${threeFigures(w)} W`;

/**
 * The published theory beside the rig: for the fountain, the closed-form rise for these
 * parameters with the pot push α and floor pull β it uses, the most α ideal links of this shape
 * could give, and where the energy goes; for every rig, its notes (including how the simulated
 * pile was calibrated).
 */
export function TheoryPanel({ rig, params, theory, unit, coefficients, className }: TheoryPanelProps) {
  const notes = RIG_CATALOG[rig].notes ?? [];
  const fountain = rig === "fountain" ? fountainTheoryFor(params) : null;
  const t = fountain?.theory ?? null;
  const riseUnit = unit && perSi("m", unit) !== 1 ? unit : "cm";
  return (
    <section aria-labelledby="theory-title" className={cx("grid gap-3", className)}>
      <h2 id="theory-title" className="text-[max(1.1rem,2.8vh)] font-bold">
        Theory
      </h2>
      {fountain ? (
        fountain.problem ? (
          <p className="font-bold text-warn">{fountain.problem}</p>
        ) : t ? (
          <>
            <p>
              Closed form: rise above the pot <span className="font-mono font-bold">h₂ = α·h₁ / (1 − α − β)</span> ={" "}
              <span className="font-mono font-bold">{withUncertainty(t.rise * perSi("m", riseUnit), null, riseUnit)}</span> for a drop h₁ = {threeFigures(t.potHeight)} m
              (h₂/h₁ = {threeFigures(t.riseRatio)}; chain speed {threeFigures(t.speed)} m/s).
            </p>
            {coefficients ? (
              <div className="grid grid-cols-2 gap-3">
                <TextField
                  label="Pot push α"
                  inputMode="decimal"
                  value={coefficients.values.theoryAlpha}
                  placeholder={String(t.alpha)}
                  error={coefficients.errors["params.theoryAlpha"]}
                  onChange={(e) => coefficients.onChange("theoryAlpha", e.target.value)}
                />
                <TextField
                  label="Floor pull β"
                  inputMode="decimal"
                  value={coefficients.values.theoryBeta}
                  placeholder={String(t.beta)}
                  error={coefficients.errors["params.theoryBeta"]}
                  onChange={(e) => coefficients.onChange("theoryBeta", e.target.value)}
                />
              </div>
            ) : (
              <p>
                Uses pot push <span className="font-mono font-bold">α = {t.alpha}</span> and floor pull <span className="font-mono font-bold">β = {t.beta}</span>.
              </p>
            )}
            <p>
              Ideal links of this shape, lifted one at a time off a hard pile, could give at most{" "}
              <span className="font-mono font-bold">α = {threeFigures(t.idealAlpha)}</span>
              {t.idealAlpha === 0 ? " (round links have nothing to lever with)" : ""}.
            </p>
            {t.budget ? (
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
                <dt>Released by the falling chain</dt>
                <dd className="whitespace-nowrap font-mono">{watts(t.budget.released)}</dd>
                <dt>Carried as kinetic energy</dt>
                <dd className="whitespace-nowrap font-mono">{watts(t.budget.kineticFlux)}</dd>
                <dt>Lost where links leave the pile</dt>
                <dd className="whitespace-nowrap font-mono">{watts(t.budget.lostAtPile)}</dd>
                <dt>Lost where links land on the floor</dt>
                <dd className="whitespace-nowrap font-mono">{watts(t.budget.lostAtFloor)}</dd>
              </dl>
            ) : (
              <p className="text-warn">{t.budgetProblem}</p>
            )}
            <p className="text-ink-muted">{TYPICAL_ALPHA_NOTE}</p>
          </>
        ) : null
      ) : theory ? (
        <p>
          Closed-form value for this set-up: <span className="font-mono font-bold">{withUncertainty(theory.value, theory.uncertainty, theory.unit)}</span>
        </p>
      ) : (
        <p className="text-ink-muted">The theory value appears once the set-up is saved.</p>
      )}
      {notes.length > 0 ? (
        <details>
          <summary className="min-h-touch cursor-pointer font-bold">About this simulation (how the pile was calibrated)</summary>
          <ul className="mt-1 grid list-disc gap-2 pl-5 text-ink-muted">
            {notes.map((note) => (
              <li key={note.slice(0, 40)}>{note === CALIBRATED_PILE_NOTE ? <strong className="text-ink">Calibrated: </strong> : null}{note}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
