import type { ReactNode } from "react";
import type { ShownValue } from "@contracts/lessons";
import { LINK_SHAPE_LABELS, type LinkShape, type RigId } from "@sim/catalog";
import { RIG_NAMES } from "@contracts/lesson-questions";
import type { SetupDraft } from "@/components/trial-setup/setup-form";
import { cx } from "@/lib/cx";
import { previewNumbers } from "../utils/preview-geometry";

/**
 * A static drawing of the set-up at rest, to scale where it matters (the drop, the chain's
 * length, the span), redrawn as the parameters change. No simulation runs here: the sizes come
 * from the typed parameters (or the rig's defaults), and for the fountain the theory's crest
 * height is marked as a dotted line for the teacher.
 */
const W = 240;
const H = 150;
const FLOOR_Y = 136;
const FIXTURE = { fill: "none", strokeWidth: 2.5, strokeLinecap: "round", strokeLinejoin: "round" } as const;

function Chain({ d, shape }: { d: string; shape: LinkShape }) {
  switch (shape) {
    case "ball":
      return <path d={d} fill="none" strokeWidth={5} strokeLinecap="round" strokeDasharray="0 6" className="stroke-accent" />;
    case "bead-thread":
      return (
        <>
          <path d={d} fill="none" strokeWidth={1} className="stroke-ink-muted" />
          <path d={d} fill="none" strokeWidth={5} strokeLinecap="round" strokeDasharray="0 9" className="stroke-accent" />
        </>
      );
    case "tube":
      return <path d={d} fill="none" strokeWidth={5} strokeDasharray="7 2" className="stroke-accent" />;
    default:
      return <path d={d} fill="none" strokeWidth={3.5} strokeDasharray="6 2" className="stroke-accent" />;
  }
}

function Floor() {
  return <line x1={6} x2={W - 6} y1={FLOOR_Y} y2={FLOOR_Y} className="stroke-ink" {...FIXTURE} />;
}

/** A vertical size line with its label, e.g. the drop from the rim to the floor. */
function Measure({ x, y1, y2, label, labelSide = "right" }: { x: number; y1: number; y2: number; label: string; labelSide?: "left" | "right" }) {
  return (
    <g>
      <line x1={x} x2={x} y1={y1} y2={y2} className="stroke-ink-muted" strokeWidth={1} />
      <line x1={x - 4} x2={x + 4} y1={y1} y2={y1} className="stroke-ink-muted" strokeWidth={1} />
      <line x1={x - 4} x2={x + 4} y1={y2} y2={y2} className="stroke-ink-muted" strokeWidth={1} />
      <text x={labelSide === "right" ? x + 6 : x - 6} y={(y1 + y2) / 2 + 4} textAnchor={labelSide === "right" ? "start" : "end"} className="fill-ink text-[10px] font-bold">
        {label}
      </text>
    </g>
  );
}

const m = (value: number) => `${Number(value.toPrecision(3))} m`;

function drawing(rig: RigId, shape: LinkShape, p: Record<string, number>, theory: ShownValue | null, theorySi: number | null): { describe: string; draw: ReactNode } {
  switch (rig) {
    case "fountain": {
      const drop = p.potHeight!;
      const rise = theorySi ?? 0;
      // A fixed scale up to 2.3 m, so a higher pot is drawn higher.
      const scale = 115 / Math.max(drop + rise, 2.3);
      const rimY = FLOOR_Y - drop * scale;
      const potX = 60;
      const crestY = rimY - rise * scale;
      return {
        describe: `The pot ${m(drop)} above the floor, its chain's end over the rim${theory ? `; the theory's crest is marked ${theory.value.toPrecision(3)} ${theory.unit} above the rim` : ""}.`,
        draw: (
          <>
            <Floor />
            <path d={`M${potX - 40} ${rimY + 14} H${potX + 18} V${FLOOR_Y}`} className="stroke-ink" {...FIXTURE} />
            <path d={`M${potX - 14} ${rimY - 2} V${rimY + 12} H${potX + 14} V${rimY - 2}`} className="stroke-ink" {...FIXTURE} />
            <Chain d={`M${potX - 10} ${rimY + 8} q10 -4 20 0`} shape={shape} />
            <Chain d={`M${potX + 8} ${rimY + 6} C${potX + 10} ${rimY - 4} ${potX + 22} ${rimY - 6} ${potX + 26} ${rimY + 2} V${FLOOR_Y - 4}`} shape={shape} />
            {theory && rise > 0 ? (
              <g data-testid="preview-crest">
                <path d={`M${potX + 8} ${rimY} C${potX + 12} ${crestY - (rimY - crestY) * 0.3} ${potX + 60} ${crestY - (rimY - crestY) * 0.3} ${potX + 80} ${FLOOR_Y}`} fill="none" strokeWidth={1.5} strokeDasharray="2 3" className="stroke-ink-muted" />
                <line x1={potX - 20} x2={potX + 90} y1={crestY} y2={crestY} strokeWidth={1} strokeDasharray="4 3" className="stroke-ink-muted" />
                <text x={potX + 92} y={crestY + 4} className="fill-ink-muted text-[10px]">theory crest</text>
              </g>
            ) : null}
            <Measure x={W - 12} y1={rimY} y2={FLOOR_Y} label={`drop ${m(drop)}`} labelSide="left" />
          </>
        ),
      };
    }
    case "scale": {
      const length = p.chainLength!;
      const scale = 100 / Math.max(length, 2);
      const panY = FLOOR_Y - 24;
      const topY = panY - 4 - length * scale;
      return {
        describe: `A ${m(length)} chain held just above a scale pan, about to be let go.`,
        draw: (
          <>
            <Floor />
            <rect x={90} y={panY + 8} width={60} height={FLOOR_Y - panY - 8} rx={3} className="stroke-ink" {...FIXTURE} />
            <path d={`M86 ${panY} H154 M120 ${panY} V${panY + 8}`} className="stroke-ink" {...FIXTURE} />
            <Chain d={`M120 ${topY} V${panY - 4}`} shape={shape} />
            <path d={`M110 ${topY} H130`} className="stroke-ink" {...FIXTURE} />
            <Measure x={160} y1={topY} y2={panY - 4} label={`chain ${m(length)}`} />
          </>
        ),
      };
    }
    case "hanging": {
      const span = p.span!;
      const rise = p.heightDifference!;
      const length = Math.max(p.chainLength!, Math.hypot(span, rise));
      // A shallow parabola of the same length: L ≈ s + 8d²/(3s), so d = √(3s(L − s)/8) (common practice).
      const sag = Math.sqrt(Math.max(0, (3 * span * (length - span)) / 8));
      const scale = Math.min(180 / span, 90 / Math.max(sag + Math.abs(rise), 0.3));
      const leftY = 30 + Math.max(0, rise) * scale;
      const rightY = leftY - rise * scale;
      const x1 = W / 2 - (span * scale) / 2;
      const x2 = W / 2 + (span * scale) / 2;
      const lowY = Math.max(leftY, rightY) + sag * scale;
      return {
        describe: `A ${m(length)} chain between two supports ${m(span)} apart${rise ? `, the right one ${m(rise)} higher` : ""}.`,
        draw: (
          <>
            <Floor />
            <path d={`M${x1} ${FLOOR_Y} V${leftY} M${x2} ${FLOOR_Y} V${rightY}`} className="stroke-ink" {...FIXTURE} />
            <Chain d={`M${x1} ${leftY} Q${W / 2} ${2 * Math.min(lowY, FLOOR_Y - 6) - (leftY + rightY) / 2} ${x2} ${rightY}`} shape={shape} />
            <text x={W / 2} y={FLOOR_Y - 4} textAnchor="middle" className="fill-ink text-[10px] font-bold">
              span {m(span)}
            </text>
          </>
        ),
      };
    }
    case "heap": {
      const lift = p.liftHeight!;
      const scale = 100 / Math.max(lift, 2);
      const topY = FLOOR_Y - lift * scale;
      return {
        describe: `A chain pulled up from a heap on the floor to ${m(lift)} at ${p.speed} m/s.`,
        draw: (
          <>
            <Floor />
            <Chain d={`M80 ${FLOOR_Y - 3} q20 -14 40 0 q20 -12 40 0`} shape={shape} />
            <Chain d={`M120 ${FLOOR_Y - 8} V${topY + 10}`} shape={shape} />
            <rect x={110} y={topY} width={20} height={10} rx={2} className="stroke-ink" {...FIXTURE} />
            <Measure x={150} y1={topY} y2={FLOOR_Y} label={`lift ${m(lift)}`} />
          </>
        ),
      };
    }
    case "folded": {
      const length = p.chainLength!;
      const scale = 110 / Math.max(length / 2, 1.5);
      const bottom = 16 + (length / 2) * scale;
      return {
        describe: `A ${m(length)} chain hung in a U from one support; the free end is about to be let go.`,
        draw: (
          <>
            <path d="M80 14 H160" className="stroke-ink" {...FIXTURE} />
            <Chain d={`M108 14 V${bottom - 8} C108 ${bottom + 4} 132 ${bottom + 4} 132 ${bottom - 8} V18`} shape={shape} />
            <Measure x={170} y1={14} y2={bottom} label={`chain ${m(length)}`} />
          </>
        ),
      };
    }
  }
}

export function RigPreview({ setup, theory, theorySi, className }: {
  setup: SetupDraft;
  /** The theory value in the question's unit (shown in words), and the same in SI for the drawing. */
  theory: ShownValue | null;
  theorySi: number | null;
  className?: string;
}) {
  const numbers = previewNumbers(setup);
  const { describe, draw } = drawing(setup.rig, setup.linkShape, numbers, theory, theorySi);
  return (
    <figure className={cx("rounded-control bg-sunken p-2", className)}>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="mx-auto block h-auto w-full max-w-96"
        role="img"
        aria-label={`${RIG_NAMES[setup.rig]}, ${LINK_SHAPE_LABELS[setup.linkShape].toLowerCase()}: ${describe}`}
        data-testid="rig-preview"
      >
        {draw}
      </svg>
      <figcaption className="mt-1 text-center text-sm text-ink-muted">A sketch of the set-up at rest, drawn to scale from the parameters.</figcaption>
    </figure>
  );
}
