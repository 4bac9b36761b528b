import { and, asc, eq } from "drizzle-orm";
import type { BenchPhoto, BenchRun } from "../contracts/bench";
import type { Db } from "../db/client";
import { benchPhotos, benchRuns } from "../db/schema";

type Reader = Pick<Db, "select">;
export type BenchRunRow = typeof benchRuns.$inferSelect;
export type BenchPhotoRow = typeof benchPhotos.$inferSelect;

export function toBenchRun(row: BenchRunRow): BenchRun {
  return {
    id: row.id,
    classId: row.classId,
    lessonId: row.lessonId,
    potHeightM: row.potHeightM,
    riseM: row.riseM,
    speedMps: row.speedMps,
    heightUnit: row.heightUnit,
    note: row.note,
    source: row.source,
    photoId: row.photoId,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toBenchPhoto(row: BenchPhotoRow): BenchPhoto {
  return {
    id: row.id,
    classId: row.classId,
    mediaType: row.mediaType,
    byteSize: row.byteSize,
    url: `/api/classes/${row.classId}/bench-photos/${row.id}/image`,
    createdAt: row.createdAt.toISOString(),
  };
}

export async function listBenchRuns(db: Reader, classId: string): Promise<BenchRun[]> {
  const rows = await db.select().from(benchRuns).where(eq(benchRuns.classId, classId)).orderBy(asc(benchRuns.createdAt), asc(benchRuns.id));
  return rows.map(toBenchRun);
}

export async function listBenchPhotos(db: Reader, classId: string): Promise<BenchPhoto[]> {
  const rows = await db.select().from(benchPhotos).where(eq(benchPhotos.classId, classId)).orderBy(asc(benchPhotos.createdAt));
  return rows.map(toBenchPhoto);
}

export async function findBenchPhoto(db: Reader, classId: string, photoId: string): Promise<BenchPhotoRow | undefined> {
  const [row] = await db.select().from(benchPhotos).where(and(eq(benchPhotos.classId, classId), eq(benchPhotos.id, photoId)));
  return row;
}
