/**
 * Run one trial of a rig from the command line and print what it measured beside the theory.
 *
 *   npm run sim -- --rig fountain --set potHeight=1.5 --set linkShape=rod --seed 3 --json
 *   npm run sim -- --help
 */
import { parseArgs } from "node:util";
import { z } from "zod";
import { numberMetaOf, ParamError, RIG_IDS, RIGS, type RigDefinition, runTrial, UnstableRunError } from "../../sim";

const HELP_HEAD = `Usage: npm run sim -- --rig <${RIG_IDS.join("|")}> [--set name=value ...] [--seed N] [--json]

Runs one trial as fast as the machine allows and prints what the probes measured beside the
closed-form theory. With --json it prints one JSON object:
  { rig, params, measured: {...}, uncertainty: {...}, theory: {...}, run: { dt, steps, wallSeconds } }
Exit codes: 0 done, 2 bad parameters, 3 the run went unstable.
`;

export function helpText(): string {
  const lines = [HELP_HEAD];
  for (const rig of Object.values(RIGS) as RigDefinition[]) {
    lines.push(`--rig ${rig.id}: ${rig.label}. ${rig.summary}`);
    for (const [name, field] of Object.entries(shapeOf(rig.schema))) {
      const meta = numberMetaOf(field);
      if (meta) {
        const unit = meta.unit ? ` ${meta.unit}` : "";
        lines.push(`  ${name.padEnd(16)} ${meta.label}${unit ? ` (${meta.unit})` : ""}; ${meta.min} to ${meta.max}${unit}, default ${meta.default}${unit}`);
      } else if (field instanceof z.ZodDefault && field.def.innerType instanceof z.ZodBoolean) {
        lines.push(`  ${name.padEnd(16)} true or false; default ${String(field.def.defaultValue)}`);
      } else if (field instanceof z.ZodDefault && field.def.innerType instanceof z.ZodEnum) {
        const options = (field.def.innerType as z.ZodEnum).options.join(", ");
        lines.push(`  ${name.padEnd(16)} ${field.description ?? name}: one of ${options}; default ${String(field.def.defaultValue)}`);
      }
    }
    lines.push("");
  }
  return lines.join("\n");
}

function shapeOf(schema: z.ZodType): Record<string, z.ZodType> {
  // zod 4 keeps .refine() on the object itself, so every rig schema is a ZodObject.
  return schema instanceof z.ZodObject ? (schema.shape as Record<string, z.ZodType>) : {};
}

export interface CliResult {
  code: number;
  out: string;
  err: string;
}

/** The CLI as a function of its arguments, so tests can call it without a child process. */
export function runCli(argv: string[], now: () => number = () => performance.now()): CliResult {
  let parsed;
  try {
    parsed = parseArgs({
      args: argv,
      options: {
        rig: { type: "string" },
        set: { type: "string", multiple: true },
        seed: { type: "string" },
        json: { type: "boolean" },
        help: { type: "boolean", short: "h" },
      },
      strict: true,
    });
  } catch (error) {
    return { code: 2, out: "", err: `${(error as Error).message}\n\n${HELP_HEAD}` };
  }
  const { values } = parsed;
  if (values.help) return { code: 0, out: helpText(), err: "" };
  const rig = (RIGS as Record<string, RigDefinition>)[values.rig ?? ""];
  if (!rig) return { code: 2, out: "", err: `--rig must be one of ${RIG_IDS.filter((id) => id in RIGS).join(", ")} (got ${values.rig ?? "nothing"}).\n` };

  const input: Record<string, unknown> = {};
  for (const pair of values.set ?? []) {
    const at = pair.indexOf("=");
    if (at < 1) return { code: 2, out: "", err: `--set expects name=value (got "${pair}").\n` };
    const raw = pair.slice(at + 1).trim();
    const asNumber = Number(raw);
    input[pair.slice(0, at).trim()] = raw === "true" ? true : raw === "false" ? false : raw !== "" && Number.isFinite(asNumber) ? asNumber : raw;
  }
  const seed = values.seed === undefined ? 1 : Number(values.seed);
  if (!Number.isInteger(seed) || seed < 0) return { code: 2, out: "", err: `--seed must be a whole number from 0 (got ${values.seed}).\n` };

  try {
    const recording = runTrial(rig, input, { seed, frameRate: 0, now });
    const measured = Object.fromEntries(Object.entries(recording.measured).map(([k, v]) => [k, v.value]));
    const uncertainty = Object.fromEntries(Object.entries(recording.measured).map(([k, v]) => [k, v.uncertainty]));
    const result = {
      rig: rig.id,
      params: recording.params,
      seed,
      measured,
      uncertainty,
      theory: recording.theory,
      notes: rig.notes ?? [],
      run: { dt: recording.run.dt, steps: recording.run.steps, simulatedSeconds: recording.run.simulatedSeconds, wallSeconds: recording.run.wallSeconds },
    };
    if (values.json) return { code: 0, out: `${JSON.stringify(result)}\n`, err: "" };
    const rows = Object.entries(recording.measured).map(([key, v]) => {
      const theory = recording.theory[key];
      return `  ${key.padEnd(16)} ${format(v.value)} ± ${format(v.uncertainty)} ${v.unit}${theory === undefined ? "" : `   (theory ${format(theory)})`}`;
    });
    const notes = (rig.notes ?? []).map((note) => `Note: ${note}`);
    const out = [`${rig.label}, seed ${seed}`, ...rows, ...notes, `  ${recording.run.steps} steps of ${recording.run.dt * 1000} ms: ${recording.run.simulatedSeconds.toFixed(2)} s simulated in ${recording.run.wallSeconds?.toFixed(2)} s`].join("\n");
    return { code: 0, out: `${out}\n`, err: "" };
  } catch (error) {
    if (error instanceof ParamError) return { code: 2, out: "", err: `${error.message}\n` };
    if (error instanceof UnstableRunError) return { code: 3, out: "", err: `${error.message}\n` };
    throw error;
  }
}

const format = (n: number) => (Number.isFinite(n) ? n.toPrecision(4) : String(n));

// Run when executed directly (tsx server/simulation/cli.ts), not when imported by tests.
if (import.meta.url === `file://${process.argv[1]}`) {
  const { code, out, err } = runCli(process.argv.slice(2));
  process.stdout.write(out);
  process.stderr.write(err);
  process.exitCode = code;
}
