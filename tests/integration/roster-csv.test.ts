/**
 * A roster read from a CSV file, saved through the roster route: the server checks every row
 * again, refuses the bad ones row by row, and saves nothing unless every row is good.
 */
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { Roster } from "../../server/contracts/roster";
import { readRosterCsv } from "../../src/features/classes/utils/roster-csv";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
let teacher: HttpAgent;
beforeAll(async () => {
  teacher = new HttpAgent(ctx.stack.url);
  await signIn(teacher, PEOPLE.teacherA.email);
});

const rosterPath = () => `/api/classes/${ctx.fixture.classA}/roster`;
const savedNames = async () => (await teacher.json<Roster>(rosterPath())).body.names.map((n) => n.displayName);

const BAD_CSV = [
  "Name",
  "Lola B.", // row 2: fine
  "", // row 3: blank
  "Maximilian-Alexander Featherstonehaugh", // row 4: too long
  "lola@pupils.example", // row 5: e-mail
  "Nadia Petrova", // row 6: full name
  "Omar S.", // row 7: fine
  "lola b", // row 8: duplicate of row 2
].join("\r\n");

describe("a roster from a CSV file", () => {
  it("with bad rows: the server refuses each bad row, by position, and saves nothing", async () => {
    const before = await savedNames();
    expect(before).toEqual(["Iris P.", "Jude K.", "Kofi M."]);
    const preview = readRosterCsv(BAD_CSV);
    expect(preview.canSave).toBe(false);

    // Sent as it is, every row, as a client that skipped the preview would.
    const raws = preview.rows.map((r) => r.raw);
    const { status, body } = await teacher.json<ApiErrorBody>(rosterPath(), { method: "PUT", json: { names: raws } });
    expect(status).toBe(400);
    expect(body.error.code).toBe("validation_failed");
    const refused = Object.keys(body.error.fields ?? {}).sort();
    // names.i is the i-th row after the header: rows 3, 4, 5, 6 and 8 of the file.
    expect(refused).toEqual(["names.1", "names.2", "names.3", "names.4", "names.6"]);
    // The preview refused the same rows for the same reasons.
    const previewRefused = preview.rows.flatMap((r, i) => (r.status === "rejected" ? [`names.${i}`] : []));
    expect(previewRefused).toEqual(refused);
    expect(body.error.fields?.["names.6"]?.[0]).toMatch(/Same name as row 1/);
    expect(body.error.fields?.["names.3"]?.[0]).toMatch(/e-mail/);

    expect(await savedNames()).toEqual(before);
  });

  it("with every row good: saved whole, in file order, replacing the roster", async () => {
    const preview = readRosterCsv("Display name\nLola B.\nOmar S.\nIris P.\n");
    expect(preview.canSave).toBe(true);
    const { status, body } = await teacher.json<Roster>(rosterPath(), { method: "PUT", json: { names: preview.names } });
    expect(status).toBe(200);
    expect(body.names.map((n) => n.displayName)).toEqual(["Lola B.", "Omar S.", "Iris P."]);
    expect(await savedNames()).toEqual(["Lola B.", "Omar S.", "Iris P."]);
  });
});
