/**
 * `npm start` on a fresh data folder: it must create the cluster, migrate, seed, build the
 * client, start everything, answer at the printed URL with the sign-in page and the demo
 * accounts, and stop everything it started on Ctrl-C (SIGINT to its process group).
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, rmSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { DEMO_STAFF } from "../../server/db/seed/demo-data";
import { PROJECT_ROOT } from "../../server/paths";
import { TEST_DATA_DIR } from "../support/paths";
import { freePort } from "../support/test-stack";

const dataDir = join(TEST_DATA_DIR, `startup-${process.pid}`);
let child: ChildProcess | undefined;
let output = "";

/** True while any process of the child's group is alive. */
function groupAlive(pgid: number): boolean {
  try {
    process.kill(-pgid, 0);
    return true;
  } catch {
    return false;
  }
}

afterAll(() => {
  if (child?.pid && groupAlive(child.pid)) process.kill(-child.pid, "SIGKILL");
  rmSync(dataDir, { recursive: true, force: true });
});

function waitForOutput(pattern: RegExp, timeoutMs: number): Promise<RegExpMatchArray> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`timed out waiting for ${pattern}; output so far:\n${output}`)), timeoutMs);
    const check = () => {
      const match = output.match(pattern);
      if (match) {
        clearTimeout(timer);
        resolve(match);
      }
    };
    child!.stdout!.on("data", check);
    child!.on("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`npm start exited with ${code} before ${pattern}; output:\n${output}`));
    });
    check();
  });
}

describe("npm start on a fresh machine's data folder", () => {
  it("serves the sign-in page with the demo accounts, then stops everything on Ctrl-C", async () => {
    const [port, signInPort, smtpPort, pgPort] = [await freePort(), await freePort(), await freePort(), await freePort()];
    rmSync(dataDir, { recursive: true, force: true });
    child = spawn("npm", ["start"], {
      cwd: PROJECT_ROOT,
      detached: true, // its own process group, so SIGINT reaches npm, tsx and node like Ctrl-C does
      env: {
        ...process.env,
        LINKLEAP_DATA_DIR: dataDir,
        PORT: String(port),
        SIGN_IN_PORT: String(signInPort),
        LOCAL_SMTP_PORT: String(smtpPort),
        PG_PORT: String(pgPort),
      },
      stdio: ["ignore", "pipe", "pipe"],
    });
    child.stdout!.on("data", (d) => (output += d));
    child.stderr!.on("data", (d) => (output += d));

    const [, url] = await waitForOutput(/running at (http:\/\/\S+)/, 180_000);
    expect(url).toBe(`http://127.0.0.1:${port}`);
    expect(output).toContain("Seeded the demo school");
    for (const person of DEMO_STAFF) expect(output).toContain(person.email);

    const page = await fetch(`${url}/sign-in`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<div id="root">');
    expect(await (await fetch(`${url}/api/health`)).json()).toEqual({ ok: true });

    // The sign-in button leads to the local provider, whose page lists the demo accounts.
    const start = await fetch(`${url}/auth/google`, { redirect: "manual" });
    expect(start.status).toBe(302);
    const picker = await (await fetch(start.headers.get("location")!)).text();
    for (const person of DEMO_STAFF) expect(picker).toContain(person.displayName);

    process.kill(-child.pid!, "SIGINT");
    // npm itself dies of the signal, as on Ctrl-C; what matters is that every process of the
    // group finishes its clean-up and exits.
    const deadline = Date.now() + 30_000;
    while (groupAlive(child.pid!) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
    expect(groupAlive(child.pid!)).toBe(false);
    expect(output).toContain("SIGINT: stopping Linkleap");
    // Postgres was started by npm start, so npm start stopped it.
    expect(existsSync(join(dataDir, "postgres", "pgdata", "postmaster.pid")), `npm start's output:\n${output}`).toBe(false);
    await expect(fetch(`${url}/api/health`)).rejects.toThrow();
  });
});
