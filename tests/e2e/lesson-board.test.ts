/**
 * The lesson board in chromium against a stand-in server: the built client, a signed-in
 * session, and a socket.io server that answers the board's events as the contract in
 * server/contracts/socket-events.ts says (in memory). The real lesson handlers are written
 * separately; this checks the board's side of the contract: it watches the lesson, shows the
 * code and QR code large, counts answers without values or names, runs the trial on R, plays
 * it and sends the result once.
 */
import { existsSync, readFileSync } from "node:fs";
import { createServer, type Server as HttpServer } from "node:http";
import { extname, join, normalize } from "node:path";
import type { Browser } from "playwright-core";
import { Server } from "socket.io";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { TeacherLesson, TeacherTrial, TrialResultInput } from "../../server/contracts/lessons";
import type { ClientToServerEvents, ServerToClientEvents } from "../../server/contracts/socket-events";
import { keepScreenshot, launchBrowser, watchedPage } from "../support/browser";

const LESSON_ID = "0b6c3c1e-4d2a-4f5e-9a10-3c2d1e0f9a8b";
const TRIAL_ID = "5e2f4a6b-7c8d-4e9f-8a0b-1c2d3e4f5a6b";
const TYPES: Record<string, string> = { ".js": "text/javascript", ".html": "text/html", ".css": "text/css", ".woff2": "font/woff2", ".woff": "font/woff", ".svg": "image/svg+xml" };

const trial: TeacherTrial = {
  id: TRIAL_ID,
  position: 1,
  rig: "fountain",
  rigLabel: "Chain fountain",
  rigSummary: "A long chain pours out of a raised pot, leaps above the rim and falls to the floor.",
  params: { links: 200, potHeight: 1 },
  shownParams: [
    { key: "potHeight", label: "Height of the pot above the floor", unit: "m", value: 1 },
    { key: "links", label: "Number of links", unit: "", value: 200 },
  ],
  question: { kind: "number", prompt: "How high above the rim will the chain rise?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true },
  phase: "predict",
  answered: { 1: 3, 2: 0 },
  result: null,
  theory: { value: 13.3, uncertainty: null, unit: "cm" },
  notes: [],
  seed: null,
  measured: null,
  theoryValues: null,
  predictions: [],
  explanations: [
    { id: "9f8e7d6c-5b4a-4392-8170-6f5e4d3c2b1a", participantId: "p1", participantName: "Zed Q.", text: "The pile pushes the chain up.", shown: false, createdAt: "2026-01-01T09:10:00Z" },
  ],
  tally: { 1: null, 2: null },
  ranAt: null,
};

const lesson: TeacherLesson = {
  id: LESSON_ID,
  code: "ACE347",
  classId: "7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d",
  className: "Year 12 Physics (invented)",
  status: "open",
  showNames: false,
  planTitle: "Two drops, one chain",
  startedAt: "2026-01-01T09:00:00Z",
  endedAt: null,
  currentTrialId: TRIAL_ID,
  participants: [{ id: "p1", displayName: "Zed Q.", online: true }],
  trials: [trial],
  joinUrl: "http://127.0.0.1/join/ACE347",
};

const me = {
  id: "1d2c3b4a-5e6f-4789-a0b1-c2d3e4f5a6b7",
  displayName: "Pat Invented",
  email: "teacher@school.invalid",
  role: "teacher",
  school: { id: "2e3d4c5b-6a7f-4890-b1c2-d3e4f5a6b7c8", name: "Invented School", timeZone: "Europe/London" },
  department: null,
};

let http: HttpServer;
let io: Server<ClientToServerEvents, ServerToClientEvents>;
let base = "";
let browser: Browser;
const received: { event: string; payload: unknown }[] = [];
let state: TeacherLesson = structuredClone(lesson);
let signedIn = true;

beforeAll(async () => {
  const clientDir = inject("clientDir");
  http = createServer((req, res) => {
    const path = (req.url ?? "/").split("?")[0]!;
    if (path === "/api/session") {
      res.writeHead(200, { "content-type": "application/json" });
      return void res.end(JSON.stringify({ user: signedIn ? me : null, notice: null, demo: false }));
    }
    const file = join(clientDir, normalize(decodeURIComponent(path)).replace(/^(\.\.[/\\])+/, ""));
    const target = file.startsWith(clientDir) && existsSync(file) && extname(file) ? file : join(clientDir, "index.html");
    res.writeHead(200, { "content-type": TYPES[extname(target)] ?? "application/octet-stream" });
    res.end(readFileSync(target));
  });
  io = new Server(http);
  const changed = () => io.emit("lesson:teacher-changed", state);
  io.on("connection", (socket) => {
    socket.onAny((event: string, payload: unknown) => received.push({ event, payload }));
    socket.on("session:whoami", (ack) => ack({ data: { staffId: me.id } }));
    socket.on("lesson:watch", ({ lessonId }, ack) => {
      if (lessonId !== LESSON_ID) return ack({ error: { code: "not_found", message: "That lesson was not found." } });
      ack({ data: state });
    });
    socket.on("trial:phase", ({ trialId, phase }, ack) => {
      state = { ...state, trials: state.trials.map((t) => (t.id === trialId ? { ...t, phase } : t)) };
      ack({ data: { phase } });
      changed();
    });
    socket.on("trial:setup", ({ trialId, ...setup }, ack) => {
      const links = (setup.params as { links?: number } | undefined)?.links;
      // A refusal only the server knows about (a stand-in rule), so the field message comes from the ack.
      if (links !== undefined && links > 3000) {
        return ack({ error: { code: "validation_failed", message: "Check the set-up.", fields: { "params.links": ["Stand-in rule: at most 3000 links here"] } } });
      }
      state = { ...state, trials: state.trials.map((t) => (t.id === trialId ? { ...t, params: setup.params ?? {}, question: setup.question as TeacherTrial["question"] } : t)) };
      ack({ data: { trialId } });
      changed();
    });
    socket.on("trial:show", ({ trialId }, ack) => {
      state = { ...state, currentTrialId: trialId };
      ack({ data: { trialId } });
      changed();
    });
    socket.on("explanation:show", ({ explanationId, shown }, ack) => {
      state = { ...state, trials: state.trials.map((t) => ({ ...t, explanations: t.explanations.map((x) => (x.id === explanationId ? { ...x, shown } : x)) })) };
      ack({ data: { explanationId } });
      changed();
    });
    socket.on("trial:result", (payload: TrialResultInput, ack) => {
      state = { ...state, trials: state.trials.map((t) => (t.id === payload.trialId ? { ...t, seed: payload.seed, measured: payload.measured as TeacherTrial["measured"], ranAt: new Date().toISOString() } : t)) };
      ack({ data: { trialId: payload.trialId } });
      changed();
    });
  });
  await new Promise<void>((resolve) => http.listen(0, "127.0.0.1", resolve));
  base = `http://127.0.0.1:${(http.address() as { port: number }).port}`;
  browser = await launchBrowser();
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await io?.close();
  await new Promise((resolve) => http?.close(resolve));
});

describe("the lesson board (against a stand-in server)", () => {
  it("shows how to join, counts answers without names or values, and on R runs, plays and reports the trial once", async () => {
    const { page, problems } = await watchedPage(browser, base, { width: 1600, height: 900 });
    await page.goto(`${base}/lessons/${LESSON_ID}/board`);
    await page.getByText("ACE 347").waitFor({ timeout: 30_000 });
    // The plan the lesson started from is named under the class.
    await page.getByText("Plan: Two drops, one chain").waitFor();

    // Code and QR code at least 3 % of the screen's height (27 px here).
    const codeSize = await page.getByText("ACE 347").evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(codeSize).toBeGreaterThanOrEqual(27);
    const qr = page.getByRole("img", { name: /QR code/ });
    await qr.waitFor();
    expect((await qr.boundingBox())!.height).toBeGreaterThanOrEqual(27);
    await page.getByText("1 joined").waitFor();

    // Predict: a count, never values or names (names are off).
    await page.getByText("3 answered").waitFor();
    io.emit("answers:counted", { trialId: TRIAL_ID, round: 1, count: 4 });
    await page.getByText("4 answered").waitFor();
    expect(await page.locator("body").innerText()).not.toContain("Zed Q.");

    // The rig is drawn at rest while pupils predict.
    await page.locator("canvas").first().waitFor({ timeout: 60_000 });
    await keepScreenshot(page, "lesson-board", "predict");

    // R closes predictions (observe); the board plays the run and sends the result once.
    await page.locator("body").press("r");
    await expect.poll(() => received.filter((r) => r.event === "trial:phase").map((r) => r.payload), { timeout: 10_000 }).toEqual([{ trialId: TRIAL_ID, phase: "observe" }]);
    await expect.poll(() => received.filter((r) => r.event === "trial:result").length, { timeout: 150_000, interval: 500 }).toBe(1);
    const result = received.find((r) => r.event === "trial:result")!.payload as TrialResultInput;
    expect(result.trialId).toBe(TRIAL_ID);
    expect(result.measured.rise!.unit).toBe("m");
    expect(result.measured.rise!.value).toBeGreaterThan(0);
    expect(result.run.steps).toBeGreaterThan(1000);

    // Playback reaches the end and shows the settled value with its uncertainty, in cm.
    await page.getByText(/^\d+(\.\d+)? ± \d+(\.\d+)? cm$/).waitFor({ timeout: 30_000 });
    await keepScreenshot(page, "lesson-board", "observed");
    // Still only one result after the server's update came back.
    await page.waitForTimeout(500);
    expect(received.filter((r) => r.event === "trial:result")).toHaveLength(1);
    expect(problems).toEqual([]);
    await page.context().close();
  }, 200_000);

  it("the remote works on a phone: 44 px targets, set-up sent debounced with the server's message beside the field, names only here, Run moves the phase", async () => {
    const second = { ...structuredClone(trial), id: "6a7b8c9d-0e1f-4a2b-8c3d-4e5f6a7b8c9d", rig: "hanging" as const, rigLabel: "Hanging chain", explanations: [] };
    state = { ...structuredClone(lesson), trials: [{ ...structuredClone(trial), phase: "setup" }, second] };
    received.length = 0;
    const { page, problems } = await watchedPage(browser, base, { width: 390, height: 844 });
    await page.goto(`${base}/lessons/${LESSON_ID}/remote`);
    await page.getByRole("heading", { name: /remote/ }).waitFor({ timeout: 30_000 });
    await page.getByText("Plan: Two drops, one chain").waitFor();

    // Every button is at least 44 px tall.
    const heights = await page.getByRole("button").evaluateAll((els) => els.filter((el) => (el as HTMLElement).offsetParent !== null).map((el) => el.getBoundingClientRect().height));
    expect(heights.length).toBeGreaterThan(3);
    expect(Math.min(...heights)).toBeGreaterThanOrEqual(44);

    // The explanation carries its author's name here (never on the board unless turned on).
    await page.getByText("Zed Q.").waitFor();

    // A set-up change is sent once, after the typing stops; an out-of-range value comes back beside its field.
    const pot = page.getByLabel(/Height of the pot above the floor/);
    await pot.fill("1.5");
    await expect.poll(() => received.filter((r) => r.event === "trial:setup").length, { timeout: 5000 }).toBe(1);
    expect((received.find((r) => r.event === "trial:setup")!.payload as { params: Record<string, unknown> }).params).toMatchObject({ potHeight: 1.5, linkShape: "rod" });
    await pot.fill("4");
    // Refused here already (the rig's range), without a round trip.
    await page.getByText("Height of the pot above the floor must be from 0.2 to 3 m.").waitFor();
    expect(received.filter((r) => r.event === "trial:setup")).toHaveLength(1);
    await pot.fill("2");
    await page.getByLabel(/Number of links/).fill("3500");
    await page.getByText("Stand-in rule: at most 3000 links here").waitFor({ timeout: 5000 });
    expect(await page.getByLabel(/Number of links/).getAttribute("aria-invalid")).toBe("true");

    await page.getByRole("button", { name: "Show on the board" }).click();
    await expect.poll(() => received.filter((r) => r.event === "explanation:show").map((r) => r.payload)).toEqual([{ explanationId: trial.explanations[0]!.id, shown: true }]);
    await page.getByText("On the board", { exact: true }).waitFor();

    await page.getByRole("button", { name: /Run \(closes predictions\)/ }).click();
    await expect.poll(() => received.filter((r) => r.event === "trial:phase").map((r) => r.payload)).toEqual([{ trialId: TRIAL_ID, phase: "observe" }]);
    await keepScreenshot(page, "lesson-board", "remote");

    // Another trial can be put on the board.
    await page.getByLabel("Trial everyone sees").selectOption(second.id);
    await expect.poll(() => received.filter((r) => r.event === "trial:show").map((r) => r.payload)).toEqual([{ lessonId: LESSON_ID, trialId: second.id }]);
    // The choice stays only because the server's new view names the second trial as current.
    await expect.poll(() => page.getByLabel("Trial everyone sees").inputValue()).toBe(second.id);
    expect(problems).toEqual([]);
    await page.context().close();
  }, 120_000);

  it("someone signed out who opens the board is sent to sign in, with the board as the page to come back to", async () => {
    signedIn = false;
    try {
      const { page } = await watchedPage(browser, base);
      await page.goto(`${base}/lessons/${LESSON_ID}/board`);
      await page.waitForURL((url) => url.pathname === "/sign-in", { timeout: 15_000 });
      expect(new URL(page.url()).searchParams.get("returnTo")).toBe(`/lessons/${LESSON_ID}/board`);
      await page.context().close();
    } finally {
      signedIn = true;
    }
  }, 60_000);
});
