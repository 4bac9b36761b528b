import { useId } from "react";
import { cx } from "@/lib/cx";

/**
 * A small set of exclusive choices (radio buttons) drawn as one joined bar. Arrow keys move
 * between choices, as for any radio group; the chosen one shows a tick as well as its fill.
 */
export function ChoiceBar<T extends string>({ legend, visibleLegend, options, value, onChange }: {
  /** Read by screen readers, e.g. "Which classes to show". */
  legend: string;
  /** A short word shown before the bar, e.g. "Show". */
  visibleLegend?: string;
  options: readonly { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
}) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-x-3 gap-y-2">
      <legend className="sr-only">{legend}</legend>
      {visibleLegend ? (
        <span aria-hidden="true" className="font-bold">
          {visibleLegend}
        </span>
      ) : null}
      <div className="inline-flex rounded-control border-2 border-line-strong bg-surface p-0.5">
        {options.map((option) => {
          const checked = option.value === value;
          return (
            <label
              key={option.value}
              className={cx(
                "relative flex min-h-10 min-w-touch cursor-pointer items-center justify-center gap-1.5 rounded-[0.35rem] px-3.5 font-bold",
                "has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus",
                checked ? "bg-ink text-paper" : "text-ink hover:bg-sunken",
              )}
            >
              <input
                type="radio"
                name={name}
                value={option.value}
                checked={checked}
                onChange={() => onChange(option.value)}
                className="sr-only"
              />
              {checked ? (
                <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
                  <path d="m3 8.5 3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" strokeLinejoin="round" />
                </svg>
              ) : null}
              {option.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
