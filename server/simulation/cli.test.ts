import { describe, expect, it } from "vitest";
import { helpText, runCli } from "./cli";

describe("npm run sim", () => {
  it("--help lists every rig's parameters with units and defaults", () => {
    const help = helpText();
    for (const rig of ["fountain", "hanging", "heap"]) expect(help).toContain(`--rig ${rig}`);
    expect(help).toMatch(/potHeight\s+Height of the pot above the floor \(m\); 0\.2 to 3 m, default 1 m/);
    expect(help).toMatch(/linkShape\s+Link shape: one of rod, tube, ball, bead-thread; default rod/);
  });

  it("--json prints one object with rig, params, measured, theory and run", () => {
    const { code, out } = runCli(["--rig", "heap", "--set", "speed=2", "--seed", "4", "--json"]);
    expect(code).toBe(0);
    const result = JSON.parse(out);
    expect(result.rig).toBe("heap");
    expect(result.params.speed).toBe(2);
    expect(result.seed).toBe(4);
    expect(typeof result.measured.force).toBe("number");
    expect(Math.abs(result.measured.force - result.theory.force) / result.theory.force).toBeLessThan(0.1);
    expect(result.run.dt).toBe(0.00025);
    expect(result.run.steps).toBeGreaterThan(1000);
    expect(result.run.wallSeconds).toBeGreaterThan(0);
  }, 60_000);

  it("refuses bad input with exit code 2 and a message naming the parameter", () => {
    expect(runCli(["--rig", "pendulum"]).code).toBe(2);
    const bad = runCli(["--rig", "fountain", "--set", "potHeight=9"]);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/potHeight: Height of the pot above the floor must be from 0\.2 to 3 m/);
    expect(runCli(["--rig", "fountain", "--set", "potHeight"]).err).toMatch(/name=value/);
    expect(runCli(["--rig", "fountain", "--bogus"]).code).toBe(2);
  });
});
