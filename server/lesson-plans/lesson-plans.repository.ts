import { and, desc, eq, or } from "drizzle-orm";
import type { TrialSetup } from "../contracts/lessons";
import type { Db } from "../db/client";
import { lessonPlans, staff } from "../db/schema";

type Reader = Pick<Db, "select">;
export type PlanRow = typeof lessonPlans.$inferSelect;
export type PlanWithOwner = { plan: PlanRow; ownerName: string };

const withOwner = { plan: lessonPlans, ownerName: staff.displayName };

export async function findPlan(db: Reader, planId: string): Promise<PlanWithOwner | undefined> {
  const [row] = await db.select(withOwner).from(lessonPlans).innerJoin(staff, eq(staff.id, lessonPlans.ownerId)).where(eq(lessonPlans.id, planId));
  return row;
}

/** The teacher's own plans and the plans shared in their department, most recently changed first. */
export async function plansVisibleTo(db: Reader, who: { id: string; schoolId: string; departmentId: string | null }): Promise<PlanWithOwner[]> {
  const sharedHere = who.departmentId ? and(eq(lessonPlans.shared, true), eq(lessonPlans.departmentId, who.departmentId)) : undefined;
  return db
    .select(withOwner)
    .from(lessonPlans)
    .innerJoin(staff, eq(staff.id, lessonPlans.ownerId))
    .where(and(eq(lessonPlans.schoolId, who.schoolId), sharedHere ? or(eq(lessonPlans.ownerId, who.id), sharedHere) : eq(lessonPlans.ownerId, who.id)))
    .orderBy(desc(lessonPlans.updatedAt), desc(lessonPlans.id));
}

export interface PlanValues {
  schoolId: string;
  departmentId: string | null;
  ownerId: string;
  title: string;
  summary: string;
  shared: boolean;
  trials: TrialSetup[];
  copiedFromId?: string | null;
}

export async function insertPlan(db: Db, values: PlanValues): Promise<PlanRow> {
  const [row] = await db.insert(lessonPlans).values(values).returning();
  return row!;
}

/** Changes the plan only if `ownerId` still owns it. */
export async function updatePlan(db: Db, planId: string, ownerId: string, values: Omit<PlanValues, "schoolId" | "ownerId">): Promise<PlanRow | undefined> {
  const [row] = await db
    .update(lessonPlans)
    .set({ ...values, updatedAt: new Date() })
    .where(and(eq(lessonPlans.id, planId), eq(lessonPlans.ownerId, ownerId)))
    .returning();
  return row;
}

export async function deletePlan(db: Db, planId: string, ownerId: string): Promise<boolean> {
  const gone = await db.delete(lessonPlans).where(and(eq(lessonPlans.id, planId), eq(lessonPlans.ownerId, ownerId))).returning({ id: lessonPlans.id });
  return gone.length > 0;
}
