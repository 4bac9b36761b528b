import type { z } from "zod";
import type { RigId } from "../../sim";
import { RIG_NAMES } from "../contracts/lesson-questions";
import { PLAN_LIMITS, lessonPlanInputSchema, type LessonPlan, type LessonPlanListItem, type PlanPreview, type PlanTrial } from "../contracts/lesson-plans";
import type { TrialSetup, trialSetupSchema } from "../contracts/lessons";
import type { FieldErrors } from "../contracts/errors";
import type { Db } from "../db/client";
import { AppError } from "../http/app-error";
import { parseInput } from "../http/validate";
import { checkSetup } from "../lessons/lessons.service";
import { shownParamsOf } from "../lessons/lessons.views";
import { theoryInQuestionUnit } from "../lessons/setup-theory";
import type { Actor } from "../staff/staff.repository";
import { planForActor } from "./lesson-plans.access";
import * as repo from "./lesson-plans.repository";

type PlanInput = z.output<typeof lessonPlanInputSchema>;

/** Every trial checked as the board checks a set-up; all problems at once, keyed `trials.<i>.<field>`. */
function checkTrials(trials: z.output<typeof trialSetupSchema>[]): TrialSetup[] {
  const fields: FieldErrors = {};
  const checked = trials.map((setup, i) => {
    try {
      return checkSetup(setup);
    } catch (error) {
      if (!(error instanceof AppError) || !error.fields) throw error;
      for (const [key, messages] of Object.entries(error.fields)) (fields[`trials.${i}.${key}`] ??= []).push(...messages);
      return null;
    }
  });
  if (Object.keys(fields).length) throw new AppError("validation_failed", "Some of the details need correcting.", fields);
  return checked as TrialSetup[];
}

function planTrial(setup: TrialSetup): PlanTrial {
  return {
    ...setup,
    rigLabel: RIG_NAMES[setup.rig as RigId],
    shownParams: shownParamsOf(setup.rig as RigId, setup.params),
    theory: theoryInQuestionUnit(setup),
  };
}

function planView(actor: Actor, { plan, ownerName }: repo.PlanWithOwner): LessonPlan {
  return {
    id: plan.id,
    title: plan.title,
    summary: plan.summary,
    shared: plan.shared,
    mine: plan.ownerId === actor.id,
    ownerName,
    copiedFromId: plan.copiedFromId,
    createdAt: plan.createdAt.toISOString(),
    updatedAt: plan.updatedAt.toISOString(),
    trials: plan.trials.map(planTrial),
  };
}

export async function listPlans(db: Db, actor: Actor): Promise<LessonPlanListItem[]> {
  const rows = await repo.plansVisibleTo(db, actor);
  return rows.map((row) => {
    const { trials, ...rest } = planView(actor, row);
    return {
      ...rest,
      trialCount: trials.length,
      rigs: [...new Set(trials.map((t) => t.rigLabel))],
      trials: trials.map((t) => ({ rig: t.rig, rigLabel: t.rigLabel, prompt: t.question.prompt, theory: t.theory })),
    };
  });
}

export async function getPlan(db: Db, actor: Actor, planId: string): Promise<LessonPlan> {
  return planView(actor, await planForActor(db, actor, planId, "read"));
}

export async function createPlan(db: Db, actor: Actor, input: PlanInput): Promise<LessonPlan> {
  const trials = checkTrials(input.trials);
  const plan = await repo.insertPlan(db, {
    schoolId: actor.schoolId,
    departmentId: actor.departmentId,
    ownerId: actor.id,
    title: input.title,
    summary: input.summary,
    shared: input.shared,
    trials,
  });
  return planView(actor, { plan, ownerName: actor.displayName });
}

/** The owner replaces the plan (trials in the order given: reordering is an update). */
export async function updatePlan(db: Db, actor: Actor, planId: string, body: unknown): Promise<LessonPlan> {
  await planForActor(db, actor, planId, "write");
  const input = parseInput(lessonPlanInputSchema, body);
  const trials = checkTrials(input.trials);
  const plan = await repo.updatePlan(db, planId, actor.id, {
    // Sharing follows the owner: saved again after a move, it is shared with the new department.
    departmentId: actor.departmentId,
    title: input.title,
    summary: input.summary,
    shared: input.shared,
    trials,
  });
  if (!plan) throw new AppError("not_found", "That plan was not found.");
  return planView(actor, { plan, ownerName: actor.displayName });
}

export async function deletePlan(db: Db, actor: Actor, planId: string): Promise<void> {
  await planForActor(db, actor, planId, "write");
  await repo.deletePlan(db, planId, actor.id);
}

const COPY_SUFFIX = " (copy)";

/** A copy for the caller (the owner, or a colleague it is shared with), not shared, ready to change. */
export async function duplicatePlan(db: Db, actor: Actor, planId: string): Promise<LessonPlan> {
  const { plan: source } = await planForActor(db, actor, planId, "read");
  const title = source.title.slice(0, PLAN_LIMITS.title - COPY_SUFFIX.length).trimEnd() + COPY_SUFFIX;
  const plan = await repo.insertPlan(db, {
    schoolId: actor.schoolId,
    departmentId: actor.departmentId,
    ownerId: actor.id,
    title,
    summary: source.summary,
    shared: false,
    trials: source.trials,
    copiedFromId: source.id,
  });
  return planView(actor, { plan, ownerName: actor.displayName });
}

/** The editor's preview of one unsaved trial: its parameters as shown and the theory value. */
export function previewTrial(setup: z.output<typeof trialSetupSchema>): PlanPreview {
  const checked = checkSetup(setup);
  return { shownParams: shownParamsOf(checked.rig, checked.params), theory: theoryInQuestionUnit(checked) };
}
