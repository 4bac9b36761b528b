/**
 * `npm run bench:live`: N live lessons × 35 pupils on one Linkleap server, started as `npm start`
 * starts it (its own Postgres under .data/bench), in a separate process from the load. Each pupil
 * sends one prediction; we time prediction → the board's `prediction:added` (same clock: the
 * load process) and count predictions lost (acknowledged but missing from Postgres, or never
 * acknowledged). The same load then runs against a bare socket.io echo server in the same run,
 * so the ratio says what Linkleap's checks and storage cost. Prints figures; asserts nothing
 * about speed. Options: --lessons N (default 10) --pupils N (35) --spread-ms N (2000).
 */
import { randomUUID } from "node:crypto";
import { join } from "node:path";
import { parseArgs } from "node:util";
import pg from "pg";
import { io as connect, type Socket } from "socket.io-client";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { PROTOCOL_VERSION } from "../../server/contracts/protocol";
import type { AckReply, ClientToServerEvents, ServerToClientEvents } from "../../server/contracts/socket-events";
import { stopCluster } from "../../server/devstack/postgres";
import { projectPath } from "../../server/paths";
import { HttpAgent, signIn } from "../support/http-agent";
import { percentile, readDatabaseUrl, startChild, startLinkleap, stopChild } from "./bench-process";

type LessonSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

const { values: args } = parseArgs({
  options: {
    lessons: { type: "string", default: "10" },
    pupils: { type: "string", default: "35" },
    "spread-ms": { type: "string", default: "2000" },
  },
});
const LESSONS = Number(args.lessons);
const PUPILS = Number(args.pupils);
const SPREAD_MS = Number(args["spread-ms"]);
const DATA_DIR = projectPath(".data", "bench");
const DEMO_TEACHER = "tom.ashdown@brackenfold.example";

function openSocket(url: string, cookie?: string): Promise<LessonSocket> {
  const socket: LessonSocket = connect(url, {
    transports: ["websocket"],
    auth: { protocol: PROTOCOL_VERSION },
    extraHeaders: cookie ? { cookie } : undefined,
    forceNew: true,
  });
  return new Promise((resolve, reject) => {
    socket.once("connect", () => resolve(socket));
    socket.once("connect_error", reject);
  });
}

async function ask<T>(promise: Promise<AckReply<T>>): Promise<T> {
  const reply = await promise;
  if ("error" in reply) throw new Error(`${reply.error.code}: ${reply.error.message}`);
  return reply.data;
}

interface LoadResult {
  latencies: number[];
  ackLatencies: number[];
  acked: Set<string>;
  sent: number;
  wallMs: number;
}

/** Fires every pupil's prediction at a random moment within the spread and waits for the boards. */
async function fire(
  pupils: { lessonIndex: number; send: (clientId: string) => Promise<void> }[],
  boardSeen: Map<string, number>,
  expectBoards: (clientIds: string[]) => Promise<void>,
): Promise<LoadResult> {
  const sentAt = new Map<string, number>();
  const ackAt = new Map<string, number>();
  const acked = new Set<string>();
  const t0 = performance.now();
  const clientIds: string[] = [];
  await Promise.all(
    pupils.map(async (pupil) => {
      await new Promise((r) => setTimeout(r, Math.random() * SPREAD_MS));
      const clientId = randomUUID();
      clientIds.push(clientId);
      sentAt.set(clientId, performance.now());
      try {
        await pupil.send(clientId);
        ackAt.set(clientId, performance.now());
        acked.add(clientId);
      } catch (error) {
        console.error(`  a prediction was not acknowledged: ${(error as Error).message}`);
      }
    }),
  );
  await expectBoards(clientIds);
  const latencies = [...sentAt].filter(([id]) => boardSeen.has(id)).map(([id, t]) => boardSeen.get(id)! - t).sort((a, b) => a - b);
  const ackLatencies = [...sentAt].filter(([id]) => ackAt.has(id)).map(([id, t]) => ackAt.get(id)! - t).sort((a, b) => a - b);
  return { latencies, ackLatencies, acked, sent: sentAt.size, wallMs: performance.now() - t0 };
}

function waitFor(check: () => boolean, timeoutMs: number): Promise<boolean> {
  return new Promise((resolve) => {
    const start = Date.now();
    const timer = setInterval(() => {
      if (check() || Date.now() - start > timeoutMs) {
        clearInterval(timer);
        resolve(check());
      }
    }, 20);
  });
}

async function benchLinkleap(): Promise<LoadResult & { lost: number; stored: number }> {
  const { child, url, pgPort } = await startLinkleap(DATA_DIR);
  const sockets: LessonSocket[] = [];
  try {
    const teacher = new HttpAgent(url);
    await signIn(teacher, DEMO_TEACHER);
    const lessonIds: string[] = [];
    const trialIds: string[] = [];
    const boardSeen = new Map<string, number>();
    const codes: string[] = [];
    const participantsSeen = new Map<string, number>();
    for (let i = 0; i < LESSONS; i++) {
      const created = await teacher.post("/api/classes", { name: `Bench class ${i + 1}`, yearGroup: "Year 10", subject: "Physics" });
      const { id: classId } = (await created.json()) as { id: string };
      const started = await teacher.post(`/api/classes/${classId}/lessons`, { showNames: false });
      if (started.status !== 201) throw new Error(`starting a lesson answered ${started.status}: ${await started.text()}`);
      const { lessonId, code } = (await started.json()) as { lessonId: string; code: string };
      const board = await openSocket(url, teacher.cookieHeader());
      sockets.push(board);
      const lesson: TeacherLesson = await ask(board.emitWithAck("lesson:watch", { lessonId }));
      const trialId = lesson.currentTrialId!;
      await ask(board.emitWithAck("trial:phase", { trialId, phase: "predict" }));
      board.on("lesson:teacher-changed", (view) => participantsSeen.set(lessonId, view.participants.length));
      board.on("prediction:added", ({ prediction }) => {
        // Keyed by the pupil's id: each pupil sends once, and the board view carries no client id.
        boardSeen.set(prediction.participantId, performance.now());
      });
      lessonIds.push(lessonId);
      trialIds.push(trialId);
      codes.push(code);
    }
    console.log(`  ${LESSONS} lessons started; joining ${LESSONS * PUPILS} pupils…`);
    const pupils: { lessonIndex: number; participantId: string; socket: LessonSocket }[] = [];
    for (let i = 0; i < LESSONS; i++) {
      await Promise.all(
        Array.from({ length: PUPILS }, async (_, p) => {
          const socket = await openSocket(url);
          sockets.push(socket);
          const session = await ask(socket.emitWithAck("lesson:join", { code: codes[i]!, name: `Pupil ${p + 1}` }));
          pupils.push({ lessonIndex: i, participantId: session.participant.id, socket });
        }),
      );
    }
    // As in a classroom, pupils have joined (and each board has its list) before predictions open.
    const listed = await waitFor(() => lessonIds.every((id) => (participantsSeen.get(id) ?? 0) >= PUPILS), 30_000);
    if (!listed) console.error("  not every board listed all its pupils within 30 s");
    // Map client ids to participants so board arrivals (by participant) can be matched.
    const participantOf = new Map<string, string>();
    const seenByClient = new Map<string, number>();
    const result = await fire(
      pupils.map((pupil) => ({
        lessonIndex: pupil.lessonIndex,
        send: async (clientId) => {
          participantOf.set(clientId, pupil.participantId);
          await ask(
            pupil.socket
              .timeout(20_000)
              .emitWithAck("prediction:submit", { trialId: trialIds[pupil.lessonIndex]!, round: 1, clientId, value: 12.5, choice: null, reason: "" }),
          );
        },
      })),
      seenByClient,
      async (clientIds) => {
        await waitFor(() => clientIds.every((id) => boardSeen.has(participantOf.get(id)!)), 20_000);
        for (const id of clientIds) {
          const seen = boardSeen.get(participantOf.get(id)!);
          if (seen !== undefined) seenByClient.set(id, seen);
        }
      },
    );
    // Lost = acknowledged but not in Postgres, or sent and never acknowledged.
    const databaseUrl = readDatabaseUrl(DATA_DIR, pgPort);
    const client = new pg.Client({ connectionString: databaseUrl });
    await client.connect();
    const { rows } = await client.query<{ client_id: string }>("select client_id from predictions where trial_id = any($1::uuid[])", [trialIds]);
    await client.end();
    const stored = new Set(rows.map((r) => r.client_id));
    const lost = result.sent - [...result.acked].filter((id) => stored.has(id)).length;
    return { ...result, lost, stored: stored.size };
  } finally {
    for (const s of sockets) s.close();
    await stopChild(child);
    // Should the server have died without stopping its Postgres, do not leave it running.
    await stopCluster(join(DATA_DIR, "postgres"));
  }
}

async function benchEcho(): Promise<LoadResult> {
  const { child, match } = await startChild([projectPath("node_modules", ".bin", "tsx"), projectPath("tests", "bench", "echo-server.ts")], {}, /port=(\d+)/);
  const url = `http://127.0.0.1:${match[1]}`;
  const sockets: Socket[] = [];
  try {
    const boardSeen = new Map<string, number>();
    for (let i = 0; i < LESSONS; i++) {
      const board = connect(url, { transports: ["websocket"], forceNew: true });
      sockets.push(board);
      await board.emitWithAck("board:join", `lesson-${i}`);
      board.on("prediction:added", ({ clientId }: { clientId: string }) => boardSeen.set(clientId, performance.now()));
    }
    const pupils: { lessonIndex: number; socket: Socket }[] = [];
    for (let i = 0; i < LESSONS; i++)
      for (let p = 0; p < PUPILS; p++) {
        const socket = connect(url, { transports: ["websocket"], forceNew: true });
        sockets.push(socket);
        pupils.push({ lessonIndex: i, socket });
      }
    await waitFor(() => pupils.every((p) => p.socket.connected), 20_000);
    return await fire(
      pupils.map((pupil) => ({
        lessonIndex: pupil.lessonIndex,
        send: async (clientId) => {
          await pupil.socket.timeout(20_000).emitWithAck("prediction:submit", { lessonId: `lesson-${pupil.lessonIndex}`, clientId });
        },
      })),
      boardSeen,
      async (clientIds) => void (await waitFor(() => clientIds.every((id) => boardSeen.has(id)), 20_000)),
    );
  } finally {
    for (const s of sockets) s.close();
    await stopChild(child);
  }
}

const fmt = (ms: number) => `${ms.toFixed(1)} ms`;

async function main() {
  console.log(`bench:live — ${LESSONS} lessons × ${PUPILS} pupils, predictions spread over ${SPREAD_MS} ms, ${new Date().toISOString()}`);
  const linkleap = await benchLinkleap();
  const echo = await benchEcho();
  const rows = [
    ["", "Linkleap", "bare echo", "ratio"],
    ...([50, 95, 99] as const).map((p) => {
      const a = percentile(linkleap.latencies, p);
      const b = percentile(echo.latencies, p);
      return [`prediction → board p${p}`, fmt(a), fmt(b), `${(a / b).toFixed(1)}×`];
    }),
    ...([50, 95, 99] as const).map((p) => {
      const a = percentile(linkleap.ackLatencies, p);
      const b = percentile(echo.ackLatencies, p);
      return [`prediction → ack p${p}`, fmt(a), fmt(b), `${(a / b).toFixed(1)}×`];
    }),
    ["predictions sent", String(linkleap.sent), String(echo.sent), ""],
    ["seen on the board", String(linkleap.latencies.length), String(echo.latencies.length), ""],
    ["stored in Postgres", String(linkleap.stored), "–", ""],
  ];
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)));
  for (const row of rows) console.log(row.map((cell, c) => cell.padEnd(widths[c]!)).join("  "));
  console.log(`predictions lost: ${linkleap.lost}`);
  if (linkleap.lost > 0) process.exitCode = 1;
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
