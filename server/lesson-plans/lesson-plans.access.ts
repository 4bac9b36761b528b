import type { Db } from "../db/client";
import { forbidden, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { findPlan, type PlanRow, type PlanWithOwner } from "./lesson-plans.repository";

/**
 * Who sees a plan: its owner, and, once it is shared, colleagues of the department it was saved
 * in (same school). Anyone else learns nothing about it (404).
 */
export function canSeePlan(actor: Pick<Actor, "id" | "schoolId" | "departmentId">, plan: PlanRow): boolean {
  if (plan.schoolId !== actor.schoolId) return false;
  if (plan.ownerId === actor.id) return true;
  return plan.shared && plan.departmentId !== null && plan.departmentId === actor.departmentId;
}

/** The plan for reading ("read": owner or colleague it is shared with) or changing ("write": owner only; 403 for a colleague who sees it). */
export async function planForActor(db: Db, actor: Actor, planId: string, intent: "read" | "write"): Promise<PlanWithOwner> {
  const found = await findPlan(db, planId);
  if (!found || !canSeePlan(actor, found.plan)) throw notFound("That plan");
  if (intent === "write" && found.plan.ownerId !== actor.id) throw forbidden("Only the plan's owner can change it: duplicate it to make your own.");
  return found;
}

/** A plan the actor may start a lesson from (the same rule as reading it). */
export async function planForStart(db: Db, actor: Actor, planId: string): Promise<PlanRow> {
  return (await planForActor(db, actor, planId, "read")).plan;
}
