import { useId } from "react";
import type { TrialRecording } from "@sim/catalog";
import { seriesAt } from "@sim/run/playback";
import { Button } from "@/components/ui/button";
import { cx } from "@/lib/cx";
import type { PlaybackController } from "../hooks/playback-controller";
import { usePlaybackSnapshot } from "../hooks/use-playback";
import { perSi, withUncertainty } from "../utils/readout";

/**
 * Play, pause, slow motion, replay and a scrub slider for the recorded run. The slider is a
 * native range input: arrow keys, Home and End work on it as on any slider.
 */
export function PlaybackBar({ controller, className }: { controller: PlaybackController; className?: string }) {
  const s = usePlaybackSnapshot(controller);
  const sliderId = useId();
  const disabled = !s.ready;
  return (
    <div className={cx("flex flex-wrap items-center gap-3", className)}>
      <Button variant="primary" disabled={disabled} onClick={() => controller.toggle()} aria-keyshortcuts="Space" className="min-w-32">
        {s.playing ? "Pause" : s.ended ? "Play again" : "▶ Play"}
      </Button>
      <Button disabled={disabled} onClick={() => controller.toggleSlow()} aria-pressed={s.slow} aria-keyshortcuts="S">
        {s.slow ? "✓ Slow motion (¼)" : "Slow motion (¼)"}
      </Button>
      <Button disabled={disabled} onClick={() => controller.replay()} aria-keyshortcuts="Home">
        Replay from the start
      </Button>
      <label htmlFor={sliderId} className="sr-only">
        Moment of the run
      </label>
      <input
        id={sliderId}
        type="range"
        min={0}
        max={Math.max(s.duration, 0.001)}
        step={1 / 60}
        value={s.t}
        disabled={disabled}
        onChange={(e) => controller.seek(Number(e.target.value))}
        aria-valuetext={`${s.t.toFixed(2)} s of ${s.duration.toFixed(2)} s`}
        className="min-h-touch flex-1 cursor-pointer accent-[var(--ll-accent)]"
      />
      <span className="font-mono tabular-nums" aria-hidden="true">
        {s.t.toFixed(2)} / {s.duration.toFixed(2)} s
      </span>
    </div>
  );
}

/**
 * The measured value: while the run plays, the probe's value at this moment (settling); at the
 * end, the settled value with its uncertainty and what it was averaged over.
 */
export function MeasuredReadout({ controller, recording, quantity, unit, label }: {
  controller: PlaybackController;
  recording: TrialRecording | null;
  quantity: string;
  unit: string;
  label: string;
}) {
  const s = usePlaybackSnapshot(controller);
  if (!recording) return null;
  const settled = recording.measured[quantity];
  const series = recording.series.find((x) => x.name === quantity);
  const siUnit = settled?.unit ?? series?.unit ?? "";
  const factor = perSi(siUnit, unit);
  const showSettled = s.ended;
  let body: string;
  let note: string;
  if (showSettled && settled && Number.isFinite(settled.value)) {
    body = withUncertainty(settled.value * factor, Number.isFinite(settled.uncertainty) ? settled.uncertainty * factor : null, unit);
    note = `Simulated result, ${settled.basis}`;
  } else if (series) {
    const now = seriesAt(series, s.t);
    body = Number.isFinite(now) ? withUncertainty(now * factor, null, unit) : "–";
    note = s.ended ? "This run could not settle a value." : `Now, at ${s.t.toFixed(1)} s (still settling)`;
  } else {
    body = s.ended ? "–" : "…";
    note = s.ended ? "This run could not settle a value." : "Shown when the run ends";
  }
  return (
    <div aria-live={s.ended ? "polite" : "off"}>
      <p className="text-[max(1rem,2.6vh)] text-ink-muted">{label}</p>
      <p className="whitespace-nowrap font-mono text-[max(1.8rem,5vh)] font-bold leading-tight tabular-nums">{body}</p>
      <p className="text-[max(0.9rem,2vh)] text-ink-muted">{note}</p>
    </div>
  );
}
