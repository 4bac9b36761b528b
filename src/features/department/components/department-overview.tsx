import { lazy, Suspense, useState, type ReactNode } from "react";
import { ErrorBoundary } from "react-error-boundary";
import { useSearchParams } from "react-router";
import type { DepartmentOverview as Overview, WeeklySeries } from "@contracts/department-overview";
import { RIG_NAMES } from "@contracts/lesson-questions";
import { buttonClasses } from "@/components/ui/button";
import { ChoiceBar } from "@/components/ui/choice-bar";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { BuildingIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { LoadingState } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { departmentOverviewCsvUrl, useDepartmentOverview } from "../api/get-department-overview";
import { formatDay, formatShare, formatWeek, localToday, rangeFromParams, type OverviewRange } from "../utils/overview-range";
import { OverviewRangeForm } from "./overview-range-form";

// chart.js loads only with the overview's charts (one chunk for the three).
const chartsModule = () => import("./overview-charts");
const LessonsPerWeekChart = lazy(() => chartsModule().then((m) => ({ default: m.LessonsPerWeekChart })));
const TrialsByRigChart = lazy(() => chartsModule().then((m) => ({ default: m.TrialsByRigChart })));
const ClosenessChart = lazy(() => chartsModule().then((m) => ({ default: m.ClosenessChart })));

/** The range lives in the address (`?from=…&to=…`), so a reload or a shared link shows the same figures. */
function useRangeParam(today: string): [OverviewRange, (next: OverviewRange) => void] {
  const [params, setParams] = useSearchParams();
  const range = rangeFromParams(params, today);
  const setRange = (next: OverviewRange) =>
    setParams(
      (current) => {
        const updated = new URLSearchParams(current);
        updated.set("from", next.from);
        updated.set("to", next.to);
        return updated;
      },
      { replace: true },
    );
  return [range, setRange];
}

function ChartSlot({ what, children }: { what: string; children: ReactNode }) {
  return (
    <ErrorBoundary fallbackRender={({ error, resetErrorBoundary }) => <ErrorState title={`Could not draw the ${what}`} error={error} onRetry={resetErrorBoundary} />}>
      <Suspense fallback={<LoadingState label={`Loading the ${what}…`} />}>{children}</Suspense>
    </ErrorBoundary>
  );
}

/**
 * The head of department's overview: totals of the department's live lessons, never a pupil's
 * answers. `timeZone` is the school's, in which the server counts days and weeks.
 */
export function DepartmentOverview({ timeZone }: { timeZone: string }) {
  const today = localToday();
  const [range, setRange] = useRangeParam(today);
  const query = useDepartmentOverview(range);
  const validation = query.isError && isApiError(query.error) && query.error.code === "validation_failed" ? query.error : null;

  return (
    <Section
      title="Overview"
      description={
        <>
          Live lessons in the department, as totals: no pupil’s name or answer is shown here. Weeks start on Monday; days are
          the school’s ({timeZone}).
        </>
      }
      actions={
        <a href={departmentOverviewCsvUrl(range)} download className={buttonClasses("secondary")} data-testid="overview-csv">
          Download CSV
        </a>
      }
    >
      <div className="grid min-w-0 gap-6">
        <OverviewRangeForm
          range={range}
          today={today}
          onChange={setRange}
          errors={{ from: validation?.fieldMessage("from"), to: validation?.fieldMessage("to") }}
        />
        {query.isPending ? (
          <SkeletonList rows={3} label="Loading the overview…" />
        ) : query.isError ? (
          validation ? null : (
            <ErrorState title="Could not load the overview" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />
          )
        ) : (
          <OverviewBody overview={query.data} updating={query.isPlaceholderData} />
        )}
      </div>
    </Section>
  );
}

function OverviewBody({ overview, updating }: { overview: Overview; updating: boolean }) {
  const [groupBy, setGroupBy] = useState<"teacher" | "class">("teacher");
  const heading = `${formatDay(overview.from, true)} to ${formatDay(overview.to, true)}`;
  if (overview.totals.lessons === 0) {
    return (
      <EmptyState icon={<BuildingIcon />} title={`No live lessons from ${heading}.`}>
        When teachers in the department run live lessons, their totals appear here. Try a longer range.
      </EmptyState>
    );
  }
  // Two teachers may both have a "10A Physics": a class is named with its teacher.
  const series =
    groupBy === "teacher" ? overview.lessonsByTeacher : overview.lessonsByClass.map((c) => ({ ...c, name: `${c.name} (${c.teacherName})` }));
  const compared = overview.closeness.filter((c) => c.trialsCompared > 0);
  return (
    <div className="grid min-w-0 gap-8" aria-busy={updating || undefined} data-testid="overview-body">
      <div>
        <h3 className="sr-only">Totals</h3>
        <p className="mb-3 text-ink-muted" aria-live="polite">
          {updating ? "Updating… " : null}
          {heading}
        </p>
        <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5" data-testid="overview-totals">
          <Tile label="Lessons" value={overview.totals.lessons} />
          <Tile label="Trials run" value={overview.totals.trialsRun} />
          <Tile label="Pupils taking part" value={overview.totals.pupilsTakingPart} hint="counted once per lesson" />
          <Tile label="Classes" value={overview.totals.classesActive} hint="with a lesson" />
          <Tile label="Teachers" value={overview.totals.teachersActive} hint="with a lesson" />
        </dl>
      </div>

      <div className="grid min-w-0 gap-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h3 className="text-lg font-bold">Lessons per week</h3>
          <ChoiceBar
            legend="Group the lessons by"
            visibleLegend="By"
            options={[
              { value: "teacher", label: "Teacher" },
              { value: "class", label: "Class" },
            ]}
            value={groupBy}
            onChange={setGroupBy}
          />
        </div>
        <ChartSlot what="lessons chart">
          <LessonsPerWeekChart weeks={overview.weeks} series={series} groupLabel={groupBy} />
        </ChartSlot>
        <WeeklyTable
          caption={`Lessons per week by ${groupBy}, with pupils taking part`}
          weeks={overview.weeks}
          rowHeader={groupBy === "teacher" ? "Teacher" : "Class"}
          series={series}
          footer={{ label: "Pupils taking part", perWeek: overview.pupilsPerWeek }}
        />
      </div>

      <div className="grid min-w-0 gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] lg:items-start">
        <div className="grid min-w-0 gap-3">
          <h3 className="text-lg font-bold">Trials by rig</h3>
          <ChartSlot what="rigs chart">
            <TrialsByRigChart rigs={overview.trialsByRig} />
          </ChartSlot>
        </div>
        <table className="w-full text-left" data-testid="rigs-table">
          <caption className="mb-2 text-left font-bold">Trials run on each rig</caption>
          <thead className="text-sm text-ink-muted">
            <tr>
              <th scope="col" className="py-1 pr-4">Rig</th>
              <th scope="col" className="py-1 text-right">Trials run</th>
            </tr>
          </thead>
          <tbody>
            {overview.trialsByRig.map((r) => (
              <tr key={r.rig} className="border-t border-line">
                <th scope="row" className="py-1.5 pr-4 font-normal">{RIG_NAMES[r.rig as keyof typeof RIG_NAMES] ?? r.rig}</th>
                <td className="py-1.5 text-right font-mono">{r.trialsRun}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <div className="grid min-w-0 gap-4">
        <h3 className="text-lg font-bold">How close class predictions were</h3>
        <p className="max-w-prose text-ink-muted">
          First-round number predictions against the recorded result. “Within 10 %” is the share of all those predictions no more than
          10 % away; “median error” is the middle of the classes’ typical errors that week (each class’s median of |prediction − result| ÷ |result|).
        </p>
        <ChartSlot what="closeness chart">
          <ClosenessChart closeness={overview.closeness} />
        </ChartSlot>
        <div className="overflow-x-auto">
          <table className="w-full min-w-[34rem] text-left" data-testid="closeness-table">
            <caption className="mb-2 text-left">
              <span className="font-bold">How close class predictions were, per week</span>{" "}
              <span className="text-ink-muted">(weeks with no number predictions to compare are left out)</span>
            </caption>
            <thead className="text-sm text-ink-muted">
              <tr>
                <th scope="col" className="py-1 pr-4">Week</th>
                <th scope="col" className="py-1 pr-4 text-right">Trials compared</th>
                <th scope="col" className="py-1 pr-4 text-right">Predictions</th>
                <th scope="col" className="py-1 pr-4 text-right">Within 10 %</th>
                <th scope="col" className="py-1 text-right">Median error</th>
              </tr>
            </thead>
            <tbody>
              {compared.map((c) => (
                <tr key={c.week} className="border-t border-line">
                  <th scope="row" className="py-1.5 pr-4 font-normal whitespace-nowrap">{formatWeek(c.week)}</th>
                  <td className="py-1.5 pr-4 text-right font-mono">{c.trialsCompared}</td>
                  <td className="py-1.5 pr-4 text-right font-mono">{c.predictions}</td>
                  <td className="py-1.5 pr-4 text-right font-mono">{formatShare(c.shareWithin10)}</td>
                  <td className="py-1.5 text-right font-mono">{formatShare(c.medianRelativeError)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
    </div>
  );
}

function Tile({ label, value, hint }: { label: string; value: number; hint?: string }) {
  return (
    <div className="rounded-card border border-line bg-paper px-4 py-3">
      <dt className="font-bold text-ink-muted">
        {label}
        {hint ? <span className="block text-sm font-normal">{hint}</span> : null}
      </dt>
      <dd className="mt-1 font-mono text-3xl font-bold text-ink">{value.toLocaleString("en-GB")}</dd>
    </div>
  );
}

/** Weeks across, one row per teacher or class; the first column stays in view while scrolling sideways. */
function WeeklyTable({ caption, weeks, rowHeader, series, footer }: {
  caption: string;
  weeks: string[];
  rowHeader: string;
  series: WeeklySeries[];
  footer: { label: string; perWeek: number[] };
}) {
  const totalPerWeek = weeks.map((_, i) => series.reduce((n, s) => n + s.perWeek[i]!, 0));
  const cell = "px-2 py-1.5 text-right font-mono";
  return (
    <div className="overflow-x-auto rounded-card border border-line" tabIndex={0} role="region" aria-label={caption}>
      <table className="min-w-full text-left text-sm" data-testid="lessons-table">
        <caption className="sr-only">{caption}</caption>
        <thead className="text-ink-muted">
          <tr>
            <th scope="col" className="sticky left-0 bg-surface px-3 py-1.5">{rowHeader}</th>
            {weeks.map((w) => (
              <th key={w} scope="col" className="px-2 py-1.5 text-right whitespace-nowrap">
                <abbr title={formatWeek(w)} className="no-underline">{formatDay(w)}</abbr>
              </th>
            ))}
            <th scope="col" className="px-3 py-1.5 text-right">Total</th>
          </tr>
        </thead>
        <tbody>
          {series.map((s) => (
            <tr key={s.id} className="border-t border-line">
              <th scope="row" className="sticky left-0 bg-surface px-3 py-1.5 font-normal whitespace-nowrap">{s.name}</th>
              {s.perWeek.map((n, i) => (
                <td key={weeks[i]} className={cell}>{n || <span className="text-ink-muted">·</span>}</td>
              ))}
              <td className={`${cell} font-bold`}>{s.total}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-line-strong">
            <th scope="row" className="sticky left-0 bg-surface px-3 py-1.5">All lessons</th>
            {totalPerWeek.map((n, i) => (
              <td key={weeks[i]} className={`${cell} font-bold`}>{n}</td>
            ))}
            <td className={`${cell} font-bold`}>{totalPerWeek.reduce((a, b) => a + b, 0)}</td>
          </tr>
          <tr className="border-t border-line">
            <th scope="row" className="sticky left-0 bg-surface px-3 py-1.5">{footer.label}</th>
            {footer.perWeek.map((n, i) => (
              <td key={weeks[i]} className={cell}>{n}</td>
            ))}
            <td className={`${cell} font-bold`}>{footer.perWeek.reduce((a, b) => a + b, 0)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
