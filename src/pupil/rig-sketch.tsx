/**
 * A plain sketch of each rig for pupils' phones: fixtures in ink, the chain as a dashed line of
 * links. Drawn by hand here (not by the simulation, which the pupil page never loads); it shows
 * the idea of the set-up, not its measurements, which are listed beside it.
 */
import type { ReactNode } from "react";
import type { PublicTrial } from "@contracts/lessons";
import { cx } from "@/lib/cx";

const CHAIN = { fill: "none", strokeWidth: 4, strokeLinecap: "round", strokeDasharray: "3 3" } as const;
const FIXTURE = { fill: "none", strokeWidth: 2.5, strokeLinecap: "round", strokeLinejoin: "round" } as const;

function Floor({ y = 112 }: { y?: number }) {
  return (
    <g>
      <line x1={8} x2={192} y1={y} y2={y} className="stroke-ink" {...FIXTURE} />
      {Array.from({ length: 12 }, (_, i) => (
        <line key={i} x1={14 + i * 15} x2={8 + i * 15} y1={y} y2={y + 6} className="stroke-line-strong" strokeWidth={1.5} />
      ))}
    </g>
  );
}

/** The fountain before its run: only the release, so the sketch does not answer the question. */
const FOUNTAIN_AT_REST = {
  describe: "A pot of chain on a high shelf; one end of the chain is pulled over the rim, ready to be let go.",
  draw: () => (
    <>
      <Floor />
      <path d="M20 62 H78 V112" className="stroke-ink" {...FIXTURE} />
      <path d="M36 42 V60 H66 V42" className="stroke-ink" {...FIXTURE} />
      {/* chain heaped in the pot, its end over the rim and hanging down */}
      <path d="M40 56 q10 -4 20 0" className="stroke-accent" {...CHAIN} />
      <path d="M60 54 C62 46 70 41 76 44 C84 48 86 56 86 66 V108" className="stroke-accent" {...CHAIN} />
      <line x1={30} x2={74} y1={42} y2={42} className="stroke-line-strong" strokeWidth={1} strokeDasharray="2 2" />
    </>
  ),
};

const SKETCHES: Record<PublicTrial["rig"], { describe: string; draw: () => ReactNode }> = {
  fountain: {
    describe: "A pot of chain on a high shelf; the chain rises above the rim and falls to the floor.",
    draw: () => (
      <>
        <Floor />
        {/* shelf and pot */}
        <path d="M20 62 H78 V112" className="stroke-ink" {...FIXTURE} />
        <path d="M36 42 V60 H66 V42" className="stroke-ink" {...FIXTURE} />
        {/* chain heaped in the pot, rising, arcing over and falling */}
        <path d="M40 56 q10 -4 20 0" className="stroke-accent" {...CHAIN} />
        <path d="M58 52 C58 8 110 4 128 110" className="stroke-accent" {...CHAIN} />
        {/* rim mark */}
        <line x1={30} x2={74} y1={42} y2={42} className="stroke-line-strong" strokeWidth={1} strokeDasharray="2 2" />
      </>
    ),
  },
  hanging: {
    describe: "A chain hanging between two supports at different heights.",
    draw: () => (
      <>
        <Floor />
        <path d="M24 112 V28 M18 28 H30" className="stroke-ink" {...FIXTURE} />
        <path d="M176 112 V52 M170 52 H182" className="stroke-ink" {...FIXTURE} />
        <path d="M24 30 C60 110 130 110 176 54" className="stroke-accent" {...CHAIN} />
      </>
    ),
  },
  scale: {
    describe: "A chain held above a scale pan and let go; it falls onto the pan.",
    draw: () => (
      <>
        <Floor />
        {/* scale: body, post and pan */}
        <rect x={70} y={96} width={60} height={16} rx={3} className="stroke-ink" {...FIXTURE} />
        <line x1={100} x2={100} y1={96} y2={84} className="stroke-ink" {...FIXTURE} />
        <path d="M66 84 H134" className="stroke-ink" {...FIXTURE} />
        {/* chain hanging straight down, lowest links already on the pan */}
        <path d="M100 10 V78" className="stroke-accent" {...CHAIN} />
        <path d="M88 80 q12 -4 24 0" className="stroke-accent" {...CHAIN} />
        <path d="M92 10 H108" className="stroke-ink" {...FIXTURE} />
        {/* falling arrow */}
        <path d="M128 22 V52 M122 46 L128 52 L134 46" className="stroke-line-strong" {...FIXTURE} />
      </>
    ),
  },
  heap: {
    describe: "A chain pulled straight up off a heap on the floor at a steady speed.",
    draw: () => (
      <>
        <Floor />
        <path d="M60 110 q20 -16 40 0 q20 -14 40 0" className="stroke-accent" {...CHAIN} />
        <path d="M100 102 V20" className="stroke-accent" {...CHAIN} />
        {/* the puller and its arrow */}
        <rect x={90} y={8} width={20} height={12} rx={2} className="stroke-ink" {...FIXTURE} />
        <path d="M128 60 V26 M122 32 L128 26 L134 32" className="stroke-line-strong" {...FIXTURE} />
      </>
    ),
  },
  folded: {
    describe: "A chain hung in a U from one support; the free end is let go and falls.",
    draw: () => (
      <>
        <path d="M70 12 H130" className="stroke-ink" {...FIXTURE} />
        {/* fixed side, the fold, and the released side starting higher */}
        <path d="M86 12 V84 C86 104 114 104 114 84 V20" className="stroke-accent" {...CHAIN} />
        <path d="M142 24 V60 M136 54 L142 60 L148 54" className="stroke-line-strong" {...FIXTURE} />
      </>
    ),
  },
};

export function RigSketch({ rig, label, beforeRun, className }: {
  rig: PublicTrial["rig"];
  label: string;
  /** Before the run the fountain is drawn at rest: its arch is what pupils are predicting. */
  beforeRun: boolean;
  className?: string;
}) {
  const sketch = rig === "fountain" && beforeRun ? FOUNTAIN_AT_REST : SKETCHES[rig];
  return (
    <figure className={cx("rounded-control bg-sunken p-2", className)}>
      <svg viewBox="0 0 200 124" className="mx-auto block h-auto w-full max-w-80" role="img" aria-label={`Sketch of the ${label.toLowerCase()}: ${sketch.describe}`} data-testid="rig-sketch">
        {sketch.draw()}
      </svg>
    </figure>
  );
}
