/**
 * Bench data and photos of real runs through the real app and Postgres: validation, the
 * all-or-nothing batch, who may read and write, and how uploaded photos are checked, stored,
 * served and removed.
 */
import { existsSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { PNG } from "pngjs";
import { beforeAll, describe, expect, it } from "vitest";
import type { BenchPhoto, BenchRun } from "../../server/contracts/bench";
import { PHOTO_MAX_BYTES } from "../../server/contracts/bench";
import type { ApiErrorBody } from "../../server/contracts/errors";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
let teacher: HttpAgent;
let otherTeacher: HttpAgent;
let head: HttpAgent;
beforeAll(async () => {
  teacher = new HttpAgent(ctx.stack.url);
  otherTeacher = new HttpAgent(ctx.stack.url);
  head = new HttpAgent(ctx.stack.url);
  await signIn(teacher, PEOPLE.teacherA.email);
  await signIn(otherTeacher, PEOPLE.teacherB.email);
  await signIn(head, PEOPLE.head.email);
});

const runsPath = () => `/api/classes/${ctx.fixture.classA}/bench-runs`;
const photosPath = () => `/api/classes/${ctx.fixture.classA}/bench-photos`;
const savedRuns = async () => (await teacher.json<BenchRun[]>(runsPath())).body;

function tinyPng(width = 40, height = 30): Buffer {
  const png = new PNG({ width, height });
  png.data.fill(200);
  return PNG.sync.write(png);
}

const upload = (agent: HttpAgent, bytes: Uint8Array, name: string, type: string) => {
  const form = new FormData();
  form.append("photo", new Blob([new Uint8Array(bytes)], { type }), name);
  return agent.request(photosPath(), { method: "POST", body: form });
};

describe("bench runs", () => {
  it("a typed run is stored in SI and read back by the teacher and the head of department", async () => {
    const { status, body } = await teacher.json<BenchRun[]>(runsPath(), {
      method: "POST",
      json: { source: "typed", runs: [{ potHeight: "120", rise: "16.5", speed: "3.6", heightUnit: "cm", note: "Rod chain, 2 m" }] },
    });
    expect(status).toBe(201);
    expect(body).toHaveLength(1);
    expect(body[0]).toMatchObject({ potHeightM: 1.2, riseM: 0.165, speedMps: 3.6, heightUnit: "cm", source: "typed", lessonId: null, photoId: null });
    const forHead = await head.json<BenchRun[]>(runsPath());
    expect(forHead.status).toBe(200);
    expect(forHead.body.map((r) => r.id)).toContain(body[0]!.id);
  });

  it("bad values are refused field by field with validation_failed", async () => {
    const { status, body } = await teacher.json<ApiErrorBody>(runsPath(), {
      method: "POST",
      json: { source: "typed", runs: [{ potHeight: "", rise: "lots", speed: 25, heightUnit: "m" }] },
    });
    expect(status).toBe(400);
    expect(body.error.code).toBe("validation_failed");
    expect(body.error.fields?.["runs.0.potHeight"]?.[0]).toMatch(/missing/);
    expect(body.error.fields?.["runs.0.rise"]?.[0]).toMatch(/not a number/);
    expect(body.error.fields?.["runs.0.speed"]?.[0]).toMatch(/between 0–20 m\/s/);
  });

  it("a CSV batch with bad rows is refused row by row and nothing of it is saved", async () => {
    const before = await savedRuns();
    const { status, body } = await teacher.json<ApiErrorBody>(runsPath(), {
      method: "POST",
      json: {
        source: "csv",
        runs: [
          { potHeight: "100", rise: "14", heightUnit: "cm" }, // fine
          { potHeight: "2", rise: "14", heightUnit: "cm" }, // pot 2 cm: out of range
          { potHeight: "150", rise: "", heightUnit: "cm" }, // rise missing
          { potHeight: "80", rise: "11", heightUnit: "cm" }, // fine
        ],
      },
    });
    expect(status).toBe(400);
    expect(Object.keys(body.error.fields ?? {}).sort()).toEqual(["runs.1.potHeight", "runs.2.rise"]);
    expect(await savedRuns()).toEqual(before);
  });

  it("another teacher can neither read nor add; the head may read but not add; the owner deletes", async () => {
    expect((await otherTeacher.json(runsPath())).status).toBe(404);
    const json = { source: "typed", runs: [{ potHeight: 1, rise: 0.1, heightUnit: "m" }] };
    expect((await otherTeacher.json(runsPath(), { method: "POST", json })).status).toBe(404);
    expect((await head.json(runsPath(), { method: "POST", json })).status).toBe(403);
    const [run] = await savedRuns();
    expect((await otherTeacher.request(`${runsPath()}/${run!.id}`, { method: "DELETE" })).status).toBe(404);
    expect((await teacher.request(`${runsPath()}/${run!.id}`, { method: "DELETE" })).status).toBe(204);
    expect((await savedRuns()).map((r) => r.id)).not.toContain(run!.id);
  });
});

describe("photos of real runs", () => {
  it("a file named .png that is not an image is refused by its content", async () => {
    const res = await upload(teacher, Buffer.from("<html><script>alert(1)</script></html>"), "run.png", "image/png");
    expect(res.status).toBe(415);
    const body = (await res.json()) as ApiErrorBody;
    expect(body.error.code).toBe("unsupported_file_type");
    expect(body.error.message).toMatch(/not a JPEG, PNG or WebP/);
    // Nothing was written: the folder is not even made until a photo is accepted.
    expect(existsSync(ctx.stack.uploadsDir) ? readdirSync(ctx.stack.uploadsDir) : []).toEqual([]);
  });

  it("an oversized photo is refused with a message naming the limit", async () => {
    const big = Buffer.alloc(PHOTO_MAX_BYTES + 1024);
    tinyPng().copy(big); // a real PNG header, padded past the limit
    const res = await upload(teacher, big, "big.png", "image/png");
    expect(res.status).toBe(413);
    const body = (await res.json()) as ApiErrorBody;
    expect(body.error.code).toBe("file_too_large");
    expect(body.error.message).toContain("8 MB");
  });

  it("only the class's teacher may upload", async () => {
    expect((await upload(otherTeacher, tinyPng(), "run.png", "image/png")).status).toBe(404);
    expect((await upload(head, tinyPng(), "run.png", "image/png")).status).toBe(403);
  });

  it("a good PNG is stored under a server-made name and served back only as an image, only to readers", async () => {
    const bytes = tinyPng();
    // The client claims JPEG and a name with a path in it: neither is trusted.
    const res = await upload(teacher, bytes, "../../evil name.jpg", "image/jpeg");
    expect(res.status).toBe(201);
    const photo = (await res.json()) as BenchPhoto;
    expect(photo.mediaType).toBe("image/png");
    const files = readdirSync(ctx.stack.uploadsDir);
    expect(files).toHaveLength(1);
    expect(files[0]).toMatch(/^[0-9a-f-]{36}\.png$/);

    const served = await teacher.request(photo.url);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/png");
    expect(served.headers.get("x-content-type-options")).toBe("nosniff");
    expect(served.headers.get("content-disposition")).toBe("inline");
    expect(served.headers.get("content-security-policy")).toBe("default-src 'none'; sandbox");
    expect(Buffer.from(await served.arrayBuffer()).equals(bytes)).toBe(true);

    expect((await head.request(photo.url)).status).toBe(200);
    expect((await otherTeacher.request(photo.url)).status).toBe(404);
    expect((await new HttpAgent(ctx.stack.url).request(photo.url)).status).toBe(401);
  });

  it("a measurement on a photo is computed by the server and saved as a photo run; deleting the photo removes the file and unlinks the run", async () => {
    const [photo] = (await teacher.json<BenchPhoto[]>(photosPath())).body;
    // 0.5 m over 200 px = 2.5 mm/px; rim 400 px above the floor = 1.000 m; crest 56 px above the rim = 0.140 m.
    const marks = {
      rim: { x: 10, y: 500 },
      crest: { x: 12, y: 444 },
      floor: { x: 10, y: 900 },
      referenceStart: { x: 100, y: 700 },
      referenceEnd: { x: 220, y: 860 },
    };
    const measured = await teacher.json<BenchRun>(`${photosPath()}/${photo!.id}/measurements`, {
      method: "POST",
      json: { marks, referenceLength: 50, referenceUnit: "cm", note: "From the photo" },
    });
    expect(measured.status).toBe(201);
    expect(measured.body).toMatchObject({ source: "photo", photoId: photo!.id, potHeightM: 1, riseM: 0.14 });

    const wrong = await teacher.json<ApiErrorBody>(`${photosPath()}/${photo!.id}/measurements`, {
      method: "POST",
      json: { marks: { ...marks, floor: { x: 10, y: 300 } }, referenceLength: 50, referenceUnit: "cm" },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.code).toBe("validation_failed");

    expect((await otherTeacher.request(`${photosPath()}/${photo!.id}`, { method: "DELETE" })).status).toBe(404);
    const file = readdirSync(ctx.stack.uploadsDir)[0]!;
    expect((await teacher.request(`${photosPath()}/${photo!.id}`, { method: "DELETE" })).status).toBe(204);
    expect(existsSync(join(ctx.stack.uploadsDir, file))).toBe(false);
    expect((await teacher.request(photo!.url)).status).toBe(404);
    const run = (await savedRuns()).find((r) => r.id === measured.body.id);
    expect(run).toMatchObject({ source: "photo", photoId: null, potHeightM: 1, riseM: 0.14 });
  });
});
