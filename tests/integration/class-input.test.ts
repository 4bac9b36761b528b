/**
 * Bad input is refused with a 400, a machine-readable code and a message per field,
 * and nothing is half-saved: the tables are byte-for-byte what they were.
 */
import { asc } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { Roster } from "../../server/contracts/roster";
import type { ClassSummary } from "../../server/contracts/classes";
import { classes, rosterEntries } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
let teacher: HttpAgent;

beforeAll(async () => {
  teacher = new HttpAgent(ctx.stack.url);
  await signIn(teacher, PEOPLE.teacherA.email);
});

/** Everything in the two tables a class edit could touch, in a stable order. */
async function snapshot() {
  return {
    classes: await ctx.database.db.select().from(classes).orderBy(asc(classes.id)),
    roster: await ctx.database.db.select().from(rosterEntries).orderBy(asc(rosterEntries.id)),
  };
}
let before: Awaited<ReturnType<typeof snapshot>>;
beforeEach(async () => {
  before = await snapshot();
});

async function expectRefused(res: Promise<{ status: number; body: unknown }>, status: number, code: string) {
  const { status: got, body } = await res;
  expect(got).toBe(status);
  const error = (body as ApiErrorBody).error;
  expect(error.code).toBe(code);
  expect(await snapshot()).toEqual(before);
  return error;
}

describe("creating a class with bad input", () => {
  it("names every bad field with its own message", async () => {
    const error = await expectRefused(
      teacher.json("/api/classes", { method: "POST", json: { name: "   ", yearGroup: "x".repeat(21) } }),
      400,
      "validation_failed",
    );
    expect(error.fields?.name?.[0]).toMatch(/class name/i);
    expect(error.fields?.yearGroup?.[0]).toMatch(/20 characters/);
    expect(error.fields?.subject?.[0]).toMatch(/subject/i);
  });

  it("refuses wrong types and control characters", async () => {
    const error = await expectRefused(
      teacher.json("/api/classes", { method: "POST", json: { name: 42, yearGroup: "Year 10", subject: "Phys\u0007ics" } }),
      400,
      "validation_failed",
    );
    expect(Object.keys(error.fields ?? {}).sort()).toEqual(["name", "subject"]);
  });

  it("refuses a second current class with the same name (any case) with its own code", async () => {
    const error = await expectRefused(
      teacher.json("/api/classes", { method: "POST", json: { name: "11x physics", yearGroup: "Year 11", subject: "Physics" } }),
      409,
      "class_name_taken",
    );
    expect(error.fields?.name?.[0]).toMatch(/already have/);
  });

  it("answers a body that is not JSON with bad_request", async () => {
    const res = await teacher.request("/api/classes", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: "{ not json",
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as ApiErrorBody).error.code).toBe("bad_request");
    expect(await snapshot()).toEqual(before);
  });

  it("refuses a write that names another site as its origin", async () => {
    await expectRefused(
      teacher.json("/api/classes", {
        method: "POST",
        headers: { origin: "http://evil.example" },
        json: { name: "Sneaky", yearGroup: "Year 10", subject: "Physics" },
      }),
      403,
      "forbidden",
    );
  });
});

describe("editing a class with bad input", () => {
  it("refuses an empty change and a blank name", async () => {
    await expectRefused(teacher.json(`/api/classes/${ctx.fixture.classA}`, { method: "PATCH", json: {} }), 400, "validation_failed");
    const error = await expectRefused(
      teacher.json(`/api/classes/${ctx.fixture.classA}`, { method: "PATCH", json: { name: "" } }),
      400,
      "validation_failed",
    );
    expect(error.fields?.name).toBeDefined();
  });

  it("refuses restoring a class whose name a current class has taken since", async () => {
    const created = await teacher.json<ClassSummary>("/api/classes", { method: "POST", json: { name: "Twin", yearGroup: "Year 10", subject: "Physics" } });
    expect(created.status).toBe(201);
    expect((await teacher.json(`/api/classes/${created.body.id}/archive`, { method: "POST" })).status).toBe(200);
    expect((await teacher.json("/api/classes", { method: "POST", json: { name: "Twin", yearGroup: "Year 10", subject: "Physics" } })).status).toBe(201);
    before = await snapshot();
    await expectRefused(teacher.json(`/api/classes/${created.body.id}/restore`, { method: "POST" }), 409, "class_name_taken");
  });
});

describe("replacing a roster with bad rows", () => {
  it("reports each bad row by its index and saves nothing", async () => {
    const names = ["Iris P.", "", "Jude Kowalczyk", "jude@pupils.example", "Iris P", "N".repeat(31), "Kofi M."];
    const error = await expectRefused(
      teacher.json(`/api/classes/${ctx.fixture.classA}/roster`, { method: "PUT", json: { names } }),
      400,
      "validation_failed",
    );
    expect(Object.keys(error.fields ?? {}).sort()).toEqual(["names.1", "names.2", "names.3", "names.4", "names.5"]);
    expect(error.fields?.["names.2"]?.[0]).toMatch(/full name/);
    expect(error.fields?.["names.3"]?.[0]).toMatch(/e-mail/);
    expect(error.fields?.["names.4"]?.[0]).toMatch(/row 1/);
  });

  it("refuses more than the limit", async () => {
    const names = Array.from({ length: 61 }, (_, i) => `Pupil ${String.fromCharCode(65 + (i % 26))}${i >= 26 ? String.fromCharCode(65 + Math.floor(i / 26)) : ""}`);
    await expectRefused(teacher.json(`/api/classes/${ctx.fixture.classA}/roster`, { method: "PUT", json: { names } }), 400, "validation_failed");
  });
});

describe("a good roster edit", () => {
  it("keeps the ids of unchanged names, drops removed ones and adds new ones in order", async () => {
    const start = await teacher.json<Roster>(`/api/classes/${ctx.fixture.classA}/roster`);
    const idOf = (r: Roster, name: string) => r.names.find((n) => n.displayName === name)?.id;
    const { status, body } = await teacher.json<Roster>(`/api/classes/${ctx.fixture.classA}/roster`, {
      method: "PUT",
      json: { names: ["  Kofi   M. ", "Nia T.", "Iris P."] },
    });
    expect(status).toBe(200);
    expect(body.names.map((n) => n.displayName)).toEqual(["Kofi M.", "Nia T.", "Iris P."]);
    expect(idOf(body, "Kofi M.")).toBe(idOf(start.body, "Kofi M."));
    expect(idOf(body, "Iris P.")).toBe(idOf(start.body, "Iris P."));
    expect(body.names.map((n) => n.displayName)).not.toContain("Jude K.");
  });
});

describe("the class list", () => {
  it("orders names with their numbers as numbers, current classes first", async () => {
    for (const name of ["10B Physics", "9B Physics"]) {
      expect((await teacher.json("/api/classes", { method: "POST", json: { name, yearGroup: "Year 9", subject: "Physics" } })).status).toBe(201);
    }
    const { body } = await teacher.json<ClassSummary[]>("/api/classes?archived=include");
    const names = body.map((c) => c.name);
    expect(names.indexOf("9B Physics")).toBeLessThan(names.indexOf("10B Physics"));
    const firstArchived = body.findIndex((c) => c.archivedAt);
    expect(firstArchived).toBeGreaterThan(0);
    expect(body.slice(firstArchived).every((c) => c.archivedAt)).toBe(true);
  });
});
