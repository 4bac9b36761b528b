/**
 * The pupil page in Debian's chromium, on a phone (360×640) and a laptop (1280×800), against a
 * FAKE lesson server written here with the contract's event types (the real handlers are built
 * separately). The fake server drops the acknowledgement of the first answer and cuts the
 * connection, so the page must rejoin with its resume token and resend the same answer id.
 */
import { randomBytes, randomUUID } from "node:crypto";
import { createServer, type Server as HttpServer } from "node:http";
import express from "express";
import type { Browser } from "playwright-core";
import { Server } from "socket.io";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { ExplanationInput, PredictionInput, PublicLesson, PublicTrial, PupilSession } from "../../server/contracts/lessons";
import type { ClientToServerEvents, ServerToClientEvents } from "../../server/contracts/socket-events";
import { measurePupilFirstLoad } from "../../scripts/pupil-first-load";
import { keepScreenshot, launchBrowser, watchedPage } from "../support/browser";

const CODE = "CEK7XA";

interface Participant {
  id: string;
  displayName: string;
  resumeToken: string;
}

/** One open lesson with a fountain trial in "predict", and a record of everything pupils sent. */
const ROSTER = [
  { id: randomUUID(), displayName: "Ada F.", taken: false },
  { id: randomUUID(), displayName: "Ben K.", taken: true },
  { id: randomUUID(), displayName: "Cleo M.", taken: false },
];

function fakeLessonServer(clientDir: string, options: { roster?: boolean; question?: PublicTrial["question"] } = {}) {
  const trial: PublicTrial = {
    id: randomUUID(),
    position: 1,
    rig: "fountain",
    rigLabel: "Fountain rig",
    rigSummary: "A chain leaves a pot on a shelf, rises above the rim and falls to the floor.",
    params: { potHeight: 1.2 },
    shownParams: [
      { key: "potHeight", label: "Pot height above the floor", unit: "m", value: 1.2 },
      { key: "linkShape", label: "Link shape", unit: "", value: "ball chain" },
    ],
    question: options.question ?? {
      kind: "number",
      prompt: "How high above the rim will the chain rise?",
      quantity: "rise",
      unit: "cm",
      askReason: true,
      askExplanation: true,
      revote: true,
    },
    phase: "predict",
    answered: { 1: 0, 2: 0 },
    result: null,
    theory: null,
    answers: null,
    shownExplanations: [],
    notes: [],
  };
  const lesson: PublicLesson = {
    id: randomUUID(),
    code: CODE,
    className: "9C Physics",
    status: "open",
    joinedCount: 0,
    trialCount: 1,
    trial,
  };
  const participants: Participant[] = [];
  const joins: { by: "name" | "resumeToken"; participantId: string }[] = [];
  /** Every prediction:submit received, in order (resends included). */
  const received: PredictionInput[] = [];
  const stored = new Map<string, PredictionInput & { participantId: string }>();
  const explanations = new Map<string, ExplanationInput>();
  let dropNextAck = true;

  const app = express();
  app.use(express.static(clientDir, { index: false }));
  // With `root`, the test folder under .data/ is not refused as a dotfile path.
  app.get("/{*splat}", (_req, res) => res.sendFile("index.html", { root: clientDir }));
  const http: HttpServer = createServer(app);
  const io = new Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, { participant: Participant | null }>(http);

  const sessionOf = (p: Participant): PupilSession => ({
    lesson,
    participant: { id: p.id, displayName: p.displayName, resumeToken: p.resumeToken },
    mine: {
      predictions: [...stored.values()]
        .filter((s) => s.participantId === p.id)
        .map((s) => ({ trialId: s.trialId, round: s.round, clientId: s.clientId, value: s.value ?? null, choice: s.choice ?? null, reason: s.reason ?? "" })),
      explanations: [],
    },
  });

  io.on("connection", (socket) => {
    socket.data.participant = null;
    socket.on("lesson:lookup", ({ code }, ack) => {
      if (code !== CODE) return ack({ error: { code: "not_found", message: "No open lesson has that code." } });
      ack({ data: { lessonId: lesson.id, className: lesson.className, roster: options.roster ? ROSTER : null } });
    });
    socket.on("lesson:join", (payload, ack) => {
      let p: Participant | undefined;
      if (payload.resumeToken) {
        p = participants.find((x) => x.resumeToken === payload.resumeToken);
        if (!p) return ack({ error: { code: "not_found", message: "Join again with your name." } });
        joins.push({ by: "resumeToken", participantId: p.id });
      } else if (payload.rosterEntryId) {
        const entry = ROSTER.find((r) => r.id === payload.rosterEntryId && !r.taken);
        if (!entry) return ack({ error: { code: "name_taken", message: "Someone has already joined with that name." } });
        p = { id: randomUUID(), displayName: entry.displayName, resumeToken: randomBytes(24).toString("hex") };
        participants.push(p);
        joins.push({ by: "name", participantId: p.id });
      } else if (payload.name) {
        p = { id: randomUUID(), displayName: payload.name, resumeToken: randomBytes(24).toString("hex") };
        participants.push(p);
        joins.push({ by: "name", participantId: p.id });
      } else {
        return ack({ error: { code: "validation_failed", message: "Type your name or pick it from the list." } });
      }
      socket.data.participant = p;
      void socket.join(lesson.id);
      ack({ data: sessionOf(p) });
    });
    socket.on("prediction:submit", (payload, ack) => {
      const p = socket.data.participant;
      if (!p) return ack({ error: { code: "unauthenticated", message: "Join the lesson first." } });
      received.push(payload);
      const open = payload.round === 1 ? trial.phase === "predict" : trial.phase === "revote";
      if (!open) return ack({ error: { code: "phase_closed", message: "Predictions for this trial are closed." } });
      if (!stored.has(payload.clientId)) stored.set(payload.clientId, { ...payload, participantId: p.id });
      if (dropNextAck) {
        // Stored, but the reply is lost and the Wi-Fi drops: the page must not count it as received.
        dropNextAck = false;
        setTimeout(() => socket.conn.close(), 150);
        return;
      }
      ack({ data: { clientId: payload.clientId, storedAt: new Date().toISOString() } });
    });
    socket.on("explanation:submit", (payload, ack) => {
      if (!socket.data.participant) return ack({ error: { code: "unauthenticated", message: "Join the lesson first." } });
      if (trial.phase !== "explain") return ack({ error: { code: "phase_closed", message: "Explanations for this trial are closed." } });
      explanations.set(payload.clientId, payload);
      ack({ data: { clientId: payload.clientId, storedAt: new Date().toISOString() } });
    });
  });

  return {
    lesson,
    trial,
    participants,
    joins,
    received,
    stored,
    explanations,
    io,
    async start() {
      await new Promise<void>((resolve) => http.listen(0, "127.0.0.1", resolve));
      return `http://127.0.0.1:${(http.address() as { port: number }).port}`;
    },
    async stop() {
      io.close();
      await new Promise<void>((resolve) => http.close(() => resolve()));
    },
  };
}

let browser: Browser;
let clientDir: string;

beforeAll(async () => {
  clientDir = inject("clientDir");
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const VIEWPORTS = [
  { name: "phone", viewport: { width: 360, height: 640 } },
  { name: "laptop", viewport: { width: 1280, height: 800 } },
] as const;

describe("pupil page", () => {
  for (const { name, viewport } of VIEWPORTS) {
    it(`${name}: join, predict, survive a lost reply and a reload, then see the result beside the own prediction`, async () => {
      const server = fakeLessonServer(clientDir);
      const url = await server.start();
      const { context, page, problems } = await watchedPage(browser, url, viewport);
      const scripts: string[] = [];
      page.on("request", (r) => {
        if (r.resourceType() === "script") scripts.push(new URL(r.url()).pathname.replace(/^\//, ""));
      });
      try {
        // Join: the code typed in lower case with a dash, then a name.
        await page.goto(`${url}/join`);
        await page.getByLabel("Lesson code").fill("cek-7xa");
        await page.getByRole("button", { name: "Next" }).click();
        await page.getByRole("heading", { name: "9C Physics" }).waitFor();
        expect(new URL(page.url()).pathname).toBe(`/join/${CODE}`);
        await page.getByLabel("Your name").fill("Ada F.");
        await keepScreenshot(page, "e2e", `30-pupil-${name}-name`);
        await page.getByRole("button", { name: "Join the lesson" }).click();

        // The trial: rig, sketch, parameters with units, the question.
        await page.getByRole("heading", { name: "Fountain rig" }).waitFor();
        await expect(page.getByTestId("question").textContent()).resolves.toBe("How high above the rim will the chain rise?");
        await page.getByText("1.2 m", { exact: true }).waitFor();
        await page.getByText("Joined as").waitFor();
        expect(await page.getByTestId("rig-sketch").getAttribute("aria-label")).toMatch(/fountain rig/);
        // Before the run the sketch shows the release only, not the arch pupils are asked about.
        expect(await page.getByTestId("rig-sketch").getAttribute("aria-label")).toMatch(/ready to be let go/);

        // The first load fetched exactly the pupil page's files, which the size check measures.
        const firstLoad = measurePupilFirstLoad(clientDir).files.filter((f) => f.kind === "js").map((f) => f.file);
        expect([...new Set(scripts)].sort()).toEqual([...firstLoad].sort());

        // Predict with a decimal comma; the first reply is lost, the page resends the same id.
        await page.getByLabel("Your answer (cm)").fill("12,5");
        await page.getByLabel("Why do you think so? (optional)").fill("The chain is pushed up by the pot.");
        await keepScreenshot(page, "e2e", `31-pupil-${name}-predict`);
        await page.getByRole("button", { name: "Send my prediction" }).click();
        await page.getByText("Answer received").waitFor({ timeout: 30_000 });
        expect(server.received.length).toBe(2);
        expect(server.received[1]!.clientId).toBe(server.received[0]!.clientId);
        expect(server.received[0]!.value).toBe(12.5);
        expect(server.stored.size).toBe(1);
        // The resend came after a rejoin with the resume token, as the same participant.
        expect(server.joins.map((j) => j.by)).toEqual(["name", "resumeToken"]);
        expect(server.participants).toHaveLength(1);
        await expect(page.getByTestId("own-answer-1").textContent()).resolves.toBe("12.5 cm");
        await keepScreenshot(page, "e2e", `32-pupil-${name}-received`);

        // Reload: the same participant, the answer still shown, no name typed again.
        await page.reload();
        await page.getByRole("heading", { name: "Fountain rig" }).waitFor();
        await expect(page.getByTestId("own-answer-1").textContent()).resolves.toBe("12.5 cm");
        await page.getByText("Answer received").waitFor();
        await page.getByText("Ada F.").waitFor();
        expect(server.participants).toHaveLength(1);
        expect(server.joins.at(-1)).toEqual({ by: "resumeToken", participantId: server.participants[0]!.id });
        const stored = await page.evaluate(() => Object.keys(window.localStorage));
        expect(stored).toEqual([`linkleap.pupil.${"CEK7XA"}`]);

        // The run: the teacher moves to observe with a result; the page shows the comparison.
        server.trial.phase = "observe";
        server.trial.result = { value: 14.2, uncertainty: 0.4, unit: "cm" };
        server.trial.theory = { value: 15.1, uncertainty: null, unit: "cm" };
        server.trial.answers = [12.5, 8, 10, 10, 16, 20, 14, 30].map((value) => ({ round: 1 as const, value, choice: null }));
        server.io.to(server.lesson.id).emit("lesson:changed", server.lesson);
        await page.getByRole("heading", { name: "Your prediction and the result" }).waitFor();
        expect(await page.getByTestId("rig-sketch").getAttribute("aria-label")).toMatch(/rises above the rim/);
        await expect(page.getByTestId("compare-own").textContent()).resolves.toBe("12.5 cm");
        await expect(page.getByTestId("compare-result").textContent()).resolves.toBe("14.2 cm ± 0.4 cm");
        await expect(page.getByTestId("compare-theory").textContent()).resolves.toBe("15.1 cm");
        const plot = page.getByTestId("answer-plot");
        expect(await plot.getAttribute("aria-label")).toMatch(/8 answers.*Result 14\.2 cm \(solid line\), theory 15\.1 cm \(dashed line\), your prediction 12\.5 cm \(diamond\)/);
        await expect(plot.locator("circle").count()).resolves.toBe(8);
        await plot.getByText("You 12.5 cm").waitFor();
        await keepScreenshot(page, "e2e", `33-pupil-${name}-result`);

        // Layout: no sideways scrolling on a phone; every control at least 44 px tall.
        const layout = await page.evaluate(() => ({
          scrollWidth: document.documentElement.scrollWidth,
          small: [...document.querySelectorAll("button, input, textarea")]
            .map((el) => el.getBoundingClientRect())
            .filter((r) => r.height > 0 && r.height < 44).length,
        }));
        expect(layout.scrollWidth).toBeLessThanOrEqual(viewport.width);
        expect(layout.small).toBe(0);

        // Explain: the pupil writes why; then a re-vote keeps the first prediction in view.
        server.trial.phase = "explain";
        server.io.to(server.lesson.id).emit("lesson:changed", server.lesson);
        await page.getByLabel("Why did it happen this way?").fill("The pot pushes the chain up as links turn.");
        await page.getByRole("button", { name: "Send my explanation" }).click();
        await page.getByText("Answer received").waitFor();
        expect([...server.explanations.values()].map((e) => e.text)).toEqual(["The pot pushes the chain up as links turn."]);

        server.trial.phase = "revote";
        server.io.to(server.lesson.id).emit("lesson:changed", server.lesson);
        await page.getByRole("heading", { name: "Your second prediction" }).waitFor();
        await page.getByLabel("Your answer (cm)").fill("14");
        await page.getByRole("button", { name: "Send my prediction" }).click();
        await page.getByText("Answer received").waitFor();
        await expect(page.getByTestId("own-answer-2").textContent()).resolves.toBe("14 cm");
        await expect(page.getByTestId("compare-own").textContent()).resolves.toBe("12.5 cm");
        await expect(page.getByTestId("compare-own-2").textContent()).resolves.toBe("14 cm");
        expect(server.received.at(-1)).toMatchObject({ round: 2, value: 14 });
        await keepScreenshot(page, "e2e", `34-pupil-${name}-revote`);

        // The lesson ends: a plain screen, and nothing about the pupil left on the device.
        server.lesson.status = "ended";
        server.io.to(server.lesson.id).emit("lesson:changed", server.lesson);
        await page.getByRole("heading", { name: "This lesson has ended" }).waitFor();
        await expect(page.evaluate(() => window.localStorage.length)).resolves.toBe(0);

        expect(problems).toEqual([]);
      } finally {
        await context.close();
        await server.stop();
      }
    });
  }

  it("phone: pick a name from the roster (taken names cannot be picked) and answer a choice question", async () => {
    const server = fakeLessonServer(clientDir, {
      roster: true,
      question: {
        kind: "choice",
        prompt: "Compared with the drop, how high does the chain rise?",
        quantity: "riseRatio",
        unit: "",
        askReason: false,
        askExplanation: true,
        revote: true,
        choices: [
          { label: "It does not rise above the rim", min: null, max: 0.01 },
          { label: "A little: under a tenth of the drop", min: 0.01, max: 0.1 },
          { label: "More than a tenth of the drop", min: 0.1, max: null },
        ],
      },
    });
    const url = await server.start();
    const { context, page, problems } = await watchedPage(browser, url, { width: 360, height: 640 });
    try {
      await page.goto(`${url}/join/${CODE.toLowerCase()}`);
      await page.getByRole("group", { name: "Pick your name" }).waitFor();
      await expect(page.getByRole("button", { name: /Ben K\./ }).isDisabled()).resolves.toBe(true);
      await keepScreenshot(page, "e2e", "35-pupil-phone-roster");
      await page.getByRole("button", { name: "Cleo M." }).click();
      await page.getByText("Cleo M.").waitFor();
      expect(server.participants.map((p) => p.displayName)).toEqual(["Cleo M."]);

      // No reason asked: one tap on a choice sends it (the first reply is lost and resent).
      expect(await page.getByLabel("Why do you think so? (optional)").count()).toBe(0);
      await page.getByRole("button", { name: "A little: under a tenth of the drop" }).click();
      await page.getByText("Answer received").waitFor({ timeout: 30_000 });
      await expect(page.getByTestId("own-answer-1").textContent()).resolves.toBe("A little: under a tenth of the drop");
      expect(server.received.map((r) => r.choice)).toEqual([1, 1]);
      expect(server.stored.size).toBe(1);

      server.trial.phase = "observe";
      server.trial.result = { value: 0.14, uncertainty: 0.01, unit: "" };
      server.trial.answers = [0, 1, 1, 2, 2, 2].map((choice) => ({ round: 1 as const, value: null, choice }));
      server.io.to(server.lesson.id).emit("lesson:changed", server.lesson);
      const plot = page.getByTestId("answer-plot");
      await plot.getByText("◆ your answer").waitFor();
      await plot.getByText("│ result").waitFor();
      await plot.getByText("3 answers").waitFor();
      await keepScreenshot(page, "e2e", "36-pupil-phone-choice-result");
      expect(problems).toEqual([]);
    } finally {
      await context.close();
      await server.stop();
    }
  });
});
