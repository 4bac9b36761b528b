/**
 * Every class, bench-data, live-lesson, lesson-plan, lesson-review, planned-lesson, department, staff, invitation, pupil-data and captured-mail route against every
 * kind of caller. Teacher A owns the
 * class under test; teacher B and the head of department are in the same department; another
 * head leads a different department; a teacher at another school; the school admin.
 */
import { PNG } from "pngjs";
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import { PEOPLE, seedFixture, type Fixture, type PersonKey } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

type Caller = "anonymous" | Exclude<PersonKey, "leaver">;
const CALLERS: Caller[] = ["anonymous", "teacherA", "teacherB", "head", "otherHead", "elsewhere", "admin"];

interface RouteCase {
  route: string;
  method: "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
  path: (f: Fixture, caller: Caller) => string;
  body?: (caller: Caller, f: Fixture) => unknown;
  expected: Record<Caller, number>;
}

const ownerOnly = (ownerStatus: number): Record<Caller, number> => ({
  anonymous: 401,
  teacherA: ownerStatus,
  teacherB: 404,
  head: 403, // sees the class, may not change it
  otherHead: 404,
  elsewhere: 404,
  admin: 403,
});
const readable: Record<Caller, number> = { ...ownerOnly(200), head: 200 };
const anyTeacher = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  teacherA: status,
  teacherB: status,
  head: status,
  otherHead: status,
  elsewhere: status,
  admin: 403,
});

const adminOnly = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  teacherA: 403,
  teacherB: 403,
  head: 403,
  otherHead: 403,
  elsewhere: 403,
  admin: status,
});

/** A plan shared in teacher A's department: readable there, unknown elsewhere. */
const sharedPlan = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  teacherA: status,
  teacherB: status,
  head: status,
  otherHead: 404,
  elsewhere: 404,
  admin: 403,
});
const planBody = (title: string) => ({
  title,
  trials: [{ rig: "fountain", params: { potHeight: 1 }, question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm" } }],
});

const ROUTES: RouteCase[] = [
  { route: "GET /api/classes", method: "GET", path: () => "/api/classes", expected: anyTeacher(200) },
  {
    route: "POST /api/classes",
    method: "POST",
    path: () => "/api/classes",
    body: (caller) => ({ name: `New class of ${caller}`, yearGroup: "Year 9", subject: "Physics" }),
    expected: anyTeacher(201),
  },
  { route: "GET /api/classes/:id", method: "GET", path: (f) => `/api/classes/${f.classA}`, expected: readable },
  {
    route: "PATCH /api/classes/:id",
    method: "PATCH",
    path: (f) => `/api/classes/${f.classA}`,
    body: (caller) => ({ name: `Renamed by ${caller}` }),
    expected: ownerOnly(200),
  },
  { route: "POST /api/classes/:id/archive", method: "POST", path: (f) => `/api/classes/${f.classA}/archive`, expected: ownerOnly(200) },
  { route: "POST /api/classes/:id/restore", method: "POST", path: (f) => `/api/classes/${f.classA}/restore`, expected: ownerOnly(200) },
  { route: "GET /api/classes/:id/roster", method: "GET", path: (f) => `/api/classes/${f.classA}/roster`, expected: readable },
  {
    route: "PUT /api/classes/:id/roster",
    method: "PUT",
    path: (f) => `/api/classes/${f.classA}/roster`,
    body: () => ({ names: ["Iris P.", "Jude K.", "Kofi M.", "Lola B."] }),
    expected: ownerOnly(200),
  },
  { route: "GET /api/classes/:id/bench-runs", method: "GET", path: (f) => `/api/classes/${f.classA}/bench-runs`, expected: readable },
  {
    route: "POST /api/classes/:id/bench-runs",
    method: "POST",
    path: (f) => `/api/classes/${f.classA}/bench-runs`,
    body: () => ({ source: "typed", runs: [{ potHeight: 1, rise: 0.12, heightUnit: "m" }] }),
    expected: ownerOnly(201),
  },
  {
    route: "DELETE /api/classes/:id/bench-runs/:runId",
    method: "DELETE",
    path: (f) => `/api/classes/${f.classA}/bench-runs/${made.benchRunId}`,
    expected: ownerOnly(204),
  },
  { route: "GET /api/classes/:id/bench-photos", method: "GET", path: (f) => `/api/classes/${f.classA}/bench-photos`, expected: readable },
  {
    route: "POST /api/classes/:id/bench-photos",
    method: "POST",
    path: (f) => `/api/classes/${f.classA}/bench-photos`,
    // No file: the owner gets a 400 for the missing photo; everyone else is stopped before the body is read.
    expected: ownerOnly(400),
  },
  {
    route: "GET /api/classes/:id/bench-photos/:photoId/image",
    method: "GET",
    path: (f) => `/api/classes/${f.classA}/bench-photos/${made.benchPhotoId}/image`,
    expected: readable,
  },
  {
    route: "POST /api/classes/:id/bench-photos/:photoId/measurements",
    method: "POST",
    path: (f) => `/api/classes/${f.classA}/bench-photos/${made.benchPhotoId}/measurements`,
    body: () => ({
      marks: { rim: { x: 0, y: 500 }, crest: { x: 0, y: 444 }, floor: { x: 0, y: 900 }, referenceStart: { x: 100, y: 700 }, referenceEnd: { x: 220, y: 860 } },
      referenceLength: 0.5,
      referenceUnit: "m",
    }),
    expected: ownerOnly(201),
  },
  {
    route: "DELETE /api/classes/:id/bench-photos/:photoId",
    method: "DELETE",
    path: (f) => `/api/classes/${f.classA}/bench-photos/${made.benchPhotoId}`,
    expected: ownerOnly(204),
  },
  { route: "POST /api/classes/:id/lessons", method: "POST", path: (f) => `/api/classes/${f.classA}/lessons`, body: () => ({}), expected: ownerOnly(201) },
  { route: "GET /api/classes/:id/lessons", method: "GET", path: (f) => `/api/classes/${f.classA}/lessons`, expected: readable },
  { route: "GET /api/lessons/open", method: "GET", path: () => "/api/lessons/open", expected: anyTeacher(200) },
  { route: "POST /api/lessons/:id/end", method: "POST", path: () => `/api/lessons/${made.lessonId}/end`, expected: ownerOnly(200) },
  { route: "GET /api/lessons/recent", method: "GET", path: () => "/api/lessons/recent", expected: anyTeacher(200) },
  { route: "GET /api/planned-lessons", method: "GET", path: () => "/api/planned-lessons", expected: anyTeacher(200) },
  {
    route: "POST /api/planned-lessons",
    method: "POST",
    path: () => "/api/planned-lessons",
    body: (_c, f) => ({ classId: f.classA, plannedFor: new Date(Date.now() + 86_400_000).toISOString() }),
    expected: ownerOnly(201),
  },
  { route: "GET /api/lesson-plans", method: "GET", path: () => "/api/lesson-plans", expected: anyTeacher(200) },
  { route: "POST /api/lesson-plans", method: "POST", path: () => "/api/lesson-plans", body: (caller) => planBody(`Plan of ${caller}`), expected: anyTeacher(201) },
  { route: "POST /api/lesson-plans/preview", method: "POST", path: () => "/api/lesson-plans/preview", body: () => planBody("x").trials[0], expected: anyTeacher(200) },
  // Teacher A's plan, shared with the Science department: colleagues read and copy, only the owner changes.
  { route: "GET /api/lesson-plans/:id", method: "GET", path: () => `/api/lesson-plans/${made.planId}`, expected: sharedPlan(200) },
  {
    route: "PUT /api/lesson-plans/:id",
    method: "PUT",
    path: () => `/api/lesson-plans/${made.planId}`,
    body: () => ({ ...planBody("Changed"), shared: true }),
    expected: { ...sharedPlan(403), teacherA: 200 },
  },
  { route: "POST /api/lesson-plans/:id/duplicate", method: "POST", path: () => `/api/lesson-plans/${made.planId}/duplicate`, expected: sharedPlan(201) },
  {
    route: "DELETE /api/lesson-plans/:id",
    method: "DELETE",
    // The owner deletes a plan of its own; everyone else tries the shared one, which stays.
    path: (_f, caller) => `/api/lesson-plans/${caller === "teacherA" ? made.sparePlanId : made.planId}`,
    expected: { ...sharedPlan(403), teacherA: 204 },
  },
  // The review and its exports carry pupils' names: the lesson's own teacher only (the head sees the class, so 403).
  { route: "GET /api/lessons/:id/review", method: "GET", path: () => `/api/lessons/${made.lessonId}/review`, expected: ownerOnly(200) },
  {
    route: "GET /api/lessons/:id/exports/predictions.csv",
    method: "GET",
    path: () => `/api/lessons/${made.lessonId}/exports/predictions.csv`,
    expected: ownerOnly(200),
  },
  { route: "GET /api/lessons/:id/exports/results.csv", method: "GET", path: () => `/api/lessons/${made.lessonId}/exports/results.csv`, expected: ownerOnly(200) },
  {
    route: "GET /api/department/classes",
    method: "GET",
    path: () => "/api/department/classes",
    expected: { anonymous: 401, teacherA: 403, teacherB: 403, head: 200, otherHead: 200, elsewhere: 403, admin: 403 },
  },
  {
    route: "GET /api/department/overview",
    method: "GET",
    path: () => "/api/department/overview",
    expected: { anonymous: 401, teacherA: 403, teacherB: 403, head: 200, otherHead: 200, elsewhere: 403, admin: 403 },
  },
  {
    route: "GET /api/department/overview.csv",
    method: "GET",
    path: () => "/api/department/overview.csv",
    expected: { anonymous: 401, teacherA: 403, teacherB: 403, head: 200, otherHead: 200, elsewhere: 403, admin: 403 },
  },
  {
    route: "GET /api/staff",
    method: "GET",
    path: () => "/api/staff",
    expected: { anonymous: 401, teacherA: 403, teacherB: 403, head: 403, otherHead: 403, elsewhere: 403, admin: 200 },
  },
  {
    route: "PATCH /api/staff/:id",
    method: "PATCH",
    path: (f) => `/api/staff/${f.staffIds.teacherB}`,
    body: () => ({ role: "teacher" }),
    expected: { anonymous: 401, teacherA: 403, teacherB: 403, head: 403, otherHead: 403, elsewhere: 403, admin: 200 },
  },
  {
    // The same route moving someone between departments (teacher B is already in this one: no change).
    route: "PATCH /api/staff/:id (department)",
    method: "PATCH",
    path: (f) => `/api/staff/${f.staffIds.teacherB}`,
    body: (_caller, f) => ({ departmentId: f.departmentId }),
    expected: adminOnly(200),
  },
  { route: "DELETE /api/staff/:id", method: "DELETE", path: (f) => `/api/staff/${f.staffIds.leaver}`, expected: adminOnly(204) },
  { route: "GET /api/invitations", method: "GET", path: () => "/api/invitations", expected: adminOnly(200) },
  {
    route: "POST /api/invitations",
    method: "POST",
    path: () => "/api/invitations",
    body: (caller, f) => ({
      displayName: `New colleague of ${caller}`,
      email: `new.${caller.toLowerCase()}@northfen.example`,
      role: "teacher",
      departmentId: f.departmentId,
    }),
    expected: adminOnly(201),
  },
  {
    route: "POST /api/invitations/:id/resend",
    method: "POST",
    path: (f) => `/api/invitations/${f.invitationId}/resend`,
    expected: adminOnly(200),
  },
  { route: "DELETE /api/invitations/:id", method: "DELETE", path: (f) => `/api/invitations/${f.invitationId}`, expected: adminOnly(204) },
  { route: "GET /api/school/departments", method: "GET", path: () => "/api/school/departments", expected: adminOnly(200) },
  {
    route: "GET /api/school/retention",
    method: "GET",
    path: () => "/api/school/retention",
    expected: { anonymous: 401, teacherA: 200, teacherB: 200, head: 200, otherHead: 200, elsewhere: 200, admin: 200 },
  },
  {
    route: "PUT /api/school/retention",
    method: "PUT",
    path: () => "/api/school/retention",
    body: () => ({ period: "days_90" }),
    expected: adminOnly(200),
  },
  {
    route: "PUT /api/school/time-zone",
    method: "PUT",
    path: () => "/api/school/time-zone",
    body: () => ({ timeZone: "Europe/London" }),
    expected: adminOnly(200),
  },
  { route: "GET /api/school/classes", method: "GET", path: () => "/api/school/classes", expected: adminOnly(200) },
  {
    route: "DELETE /api/classes/:id/pupil-data",
    method: "DELETE",
    path: (f) => `/api/classes/${f.classA}/pupil-data`,
    // The class's teacher and the school admin; the head sees the class but may not delete.
    expected: { ...ownerOnly(200), admin: 200 },
  },
  {
    route: "GET /api/dev/mail",
    method: "GET",
    path: () => "/api/dev/mail",
    // For anyone but an admin the page does not exist.
    expected: { anonymous: 401, teacherA: 404, teacherB: 404, head: 404, otherHead: 404, elsewhere: 404, admin: 200 },
  },
];

const ctx = useTestStack(seedFixture);
const agents = new Map<Caller, HttpAgent>();
/** What teacher A makes before the matrix runs: a typed run, an uploaded photo and a live lesson. */
const made = { benchRunId: "", benchPhotoId: "", lessonId: "", planId: "", sparePlanId: "" };

beforeAll(async () => {
  for (const caller of CALLERS) {
    const agent = new HttpAgent(ctx.stack.url);
    if (caller !== "anonymous") await signIn(agent, PEOPLE[caller].email);
    agents.set(caller, agent);
  }
  const owner = agents.get("teacherA")!;
  const run = await owner.json<{ id: string }[]>(`/api/classes/${ctx.fixture.classA}/bench-runs`, {
    method: "POST",
    json: { source: "typed", runs: [{ potHeight: 1, rise: 0.13, heightUnit: "m" }] },
  });
  made.benchRunId = run.body[0]!.id;
  const form = new FormData();
  const png = new PNG({ width: 8, height: 8 });
  form.append("photo", new Blob([new Uint8Array(PNG.sync.write(png))], { type: "image/png" }), "run.png");
  const photo = await owner.request(`/api/classes/${ctx.fixture.classA}/bench-photos`, { method: "POST", body: form });
  made.benchPhotoId = ((await photo.json()) as { id: string }).id;
  const lesson = await owner.json<{ lessonId: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
  made.lessonId = lesson.body.lessonId;
  made.planId = (await owner.json<{ id: string }>("/api/lesson-plans", { method: "POST", json: { ...planBody("Shared plan"), shared: true } })).body.id;
  made.sparePlanId = (await owner.json<{ id: string }>("/api/lesson-plans", { method: "POST", json: planBody("Spare plan") })).body.id;
});

describe.each(ROUTES)("$route", ({ method, path, body, expected }) => {
  it.each(CALLERS)("as %s", async (caller) => {
    const agent = agents.get(caller)!;
    const res = await agent.request(path(ctx.fixture, caller), { method, json: body?.(caller, ctx.fixture) });
    const status = res.status;
    const text = await res.text();
    // Photos answer with image bytes; everything else, and every refusal, is JSON.
    const reply = res.headers.get("content-type")?.startsWith("application/json") ? (JSON.parse(text) as unknown) : text;
    expect(status).toBe(expected[caller]);
    if (status >= 400) {
      // Refusals carry an error code and nothing about the resource.
      const error = reply as ApiErrorBody;
      expect(Object.keys(error)).toEqual(["error"]);
      expect(error.error.code).toBe({ 400: "bad_request", 401: "unauthenticated", 403: "forbidden", 404: "not_found" }[status]);
      expect(JSON.stringify(reply)).not.toContain(ctx.fixture.classA);
      expect(JSON.stringify(reply)).not.toContain("Physics");
    }
  });
});

describe("what each caller sees", () => {
  it("someone else's class and a class that does not exist look exactly the same", async () => {
    const agent = agents.get("teacherB")!;
    const theirs = await agent.json(`/api/classes/${ctx.fixture.classA}`);
    const missing = await agent.json("/api/classes/00000000-0000-4000-8000-000000000000");
    const notAnId = await agent.json("/api/classes/not-an-id");
    expect(theirs).toEqual(missing);
    expect(notAnId).toEqual(missing);
  });

  it("a teacher's list holds only their own classes", async () => {
    const { body } = await agents.get("teacherB")!.json<{ id: string; teacher: { id: string } }[]>("/api/classes");
    expect(body.length).toBeGreaterThan(0);
    expect(body.every((c) => c.teacher.id === ctx.fixture.staffIds.teacherB)).toBe(true);
    expect(body.map((c) => c.id)).not.toContain(ctx.fixture.classA);
  });

  it("the head of department sees the department's classes read-only, and no other department's or school's", async () => {
    const { body } = await agents.get("head")!.json<{ id: string; access: string }[]>("/api/department/classes");
    const ids = body.map((c) => c.id);
    expect(ids).toEqual(expect.arrayContaining([ctx.fixture.classA, ctx.fixture.classB]));
    expect(ids).not.toContain(ctx.fixture.classElsewhere);
    expect(body.find((c) => c.id === ctx.fixture.classA)!.access).toBe("department");
    const other = await agents.get("otherHead")!.json<{ id: string }[]>("/api/department/classes");
    expect(other.body.map((c) => c.id)).not.toContain(ctx.fixture.classA);
  });
});
