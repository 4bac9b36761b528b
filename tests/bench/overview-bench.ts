/**
 * `npm run bench:overview`: the head of department's overview on a year of invented data. Starts
 * Linkleap as `npm start` does (its own Postgres under .data/bench-overview, migrated at start-up),
 * seeds a school year with scripts/seed-year.ts (≈ 4,000 lessons, ≈ 150,000 predictions), then
 * times (a) the overview service called directly from this process, on its own pool, and (b)
 * GET /api/department/overview over HTTP as a signed-in head of department, for a full year, one
 * term and one month. Prints p50 / p95 / max per case; asserts nothing about speed (the target,
 * p95 ≤ 100 ms, is printed beside the figures). Options: --runs N (default 60) --seed N (2026).
 */
import { cpus, loadavg } from "node:os";
import { join } from "node:path";
import { parseArgs } from "node:util";
import { connectDatabase } from "../../server/db/client";
import { stopCluster } from "../../server/devstack/postgres";
import { departmentOverview } from "../../server/department/department-overview.service";
import { addDays, type DepartmentOverview } from "../../server/contracts/department-overview";
import { DEFAULT_SCHOOL_TIME_ZONE } from "../../server/contracts/school";
import { projectPath } from "../../server/paths";
import { seedYear } from "../../scripts/seed-year";
import { HttpAgent, signIn } from "../support/http-agent";
import { percentile, readDatabaseUrl, startLinkleap, stopChild } from "./bench-process";

const { values: args } = parseArgs({ options: { runs: { type: "string", default: "60" }, seed: { type: "string", default: "2026" } } });
const RUNS = Number(args.runs);
const WARM_UP = 5;
const TARGET_MS = 100;
const DATA_DIR = projectPath(".data", "bench-overview");

async function time(run: () => Promise<unknown>): Promise<number[]> {
  for (let i = 0; i < WARM_UP; i++) await run();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t = performance.now();
    await run();
    times.push(performance.now() - t);
  }
  return times.sort((a, b) => a - b);
}

const fmt = (ms: number) => `${ms.toFixed(1)} ms`;

async function main() {
  console.log(`bench:overview — ${RUNS} timed runs per case after ${WARM_UP} warm-up runs, ${new Date().toISOString()}`);
  // Other work on the machine shows in the figures: say how busy it was.
  const load = () => `load average ${loadavg().map((l) => l.toFixed(2)).join(" / ")} on ${cpus().length} cores`;
  console.log(`  ${load()}`);
  const { child, url, pgPort } = await startLinkleap(DATA_DIR);
  const database = connectDatabase(readDatabaseUrl(DATA_DIR, pgPort));
  try {
    console.log("Seeding a school year of invented lessons…");
    const year = await seedYear(database.pool, { seed: Number(args.seed) });
    console.log(
      `  seeded in ${(year.ms / 1000).toFixed(1)} s: ${year.counts.lessons} lessons, ${year.counts.participants} pupils taking part, ` +
        `${year.counts.trials} trials, ${year.counts.predictions} predictions (${year.first} to ${year.last})`,
    );
    const science = year.departments[0]!;
    const spring = Number(year.first.slice(0, 4)) + 1;
    const ranges = [
      { label: "full year", from: year.first, to: year.last },
      // The autumn term: the first 16 weeks (holiday weeks included), to a Friday.
      { label: "one term", from: year.first, to: addDays(year.first, 7 * 15 + 4) },
      { label: "one month", from: `${spring}-03-01`, to: `${spring}-03-31` },
    ];

    const head = new HttpAgent(url);
    await signIn(head, science.head.email, { name: science.head.name });

    const rows: string[][] = [["case", "range", "p50", "p95", "max", `p95 ≤ ${TARGET_MS} ms`, "what came back"]];
    for (const range of ranges) {
      const query = { from: range.from, to: range.to };
      let last: DepartmentOverview | null = null;
      const direct = await time(async () => (last = await departmentOverview(database.db, { departmentId: science.id, timeZone: DEFAULT_SCHOOL_TIME_ZONE }, query)));
      const shape = (o: DepartmentOverview) =>
        `${o.totals.lessons} lessons, ${o.totals.trialsRun} trials run, ${o.totals.pupilsTakingPart} pupils, ${o.weeks.length} weeks × ${o.lessonsByClass.length} classes`;
      const add = (name: string, times: number[], what: string) =>
        rows.push([name, `${range.label} (${range.from} to ${range.to})`, fmt(percentile(times, 50)), fmt(percentile(times, 95)), fmt(times[times.length - 1]!), percentile(times, 95) <= TARGET_MS ? "yes" : "NO", what]);
      add("overview service (direct)", direct, shape(last!));

      let bytes = 0;
      const http = await time(async () => {
        const res = await head.get(`/api/department/overview?from=${range.from}&to=${range.to}`);
        if (res.status !== 200) throw new Error(`the overview answered ${res.status}: ${await res.text()}`);
        bytes = (await res.arrayBuffer()).byteLength;
      });
      add("GET /api/department/overview", http, `${(bytes / 1024).toFixed(1)} KB JSON`);

      let csvRows = 0;
      const csv = await time(async () => {
        const res = await head.get(`/api/department/overview.csv?from=${range.from}&to=${range.to}`);
        if (res.status !== 200) throw new Error(`the CSV answered ${res.status}`);
        // Data rows: lines after the header, not counting the empty one after the last line end.
        csvRows = (await res.text()).split("\r\n").filter((line) => line !== "").length - 1;
      });
      add("GET /api/department/overview.csv", csv, `${csvRows} CSV rows`);
    }
    const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)));
    for (const row of rows) console.log(row.map((cell, c) => cell.padEnd(widths[c]!)).join("  "));
    console.log(`  ${load()}`);
  } finally {
    await database.close();
    await stopChild(child);
    // Should the server have died without stopping its Postgres, do not leave it running.
    await stopCluster(join(DATA_DIR, "postgres"));
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
