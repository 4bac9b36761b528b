/**
 * The database schema. `npm run db:generate` turns changes here into SQL migrations in
 * drizzle/, which the server applies once at start-up (see migrate.ts).
 */
import { sql } from "drizzle-orm";
import {
  boolean,
  doublePrecision,
  index,
  integer,
  json,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from "drizzle-orm/pg-core";
import type { PupilDataKind } from "../contracts/retention";
import { DEFAULT_RETENTION, RETENTION_PERIODS } from "../contracts/retention";
import { DEFAULT_SCHOOL_TIME_ZONE } from "../contracts/school";
import { STAFF_ROLES } from "../contracts/staff-roles";
import type { BenchSource, HeightUnit, PhotoMediaType } from "../contracts/bench";
import type { PhotoMarks } from "../contracts/photo-measure";
import type { Question, Tally, TheoryValues, TrialSetup } from "../contracts/lessons";
import type { TrialPhase } from "../contracts/lesson-rules";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();

export const retentionPeriod = pgEnum("retention_period", RETENTION_PERIODS);

export const schools = pgTable("schools", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  /** How long pupil data is kept before the scheduled purge deletes it. */
  pupilDataRetention: retentionPeriod("pupil_data_retention").notNull().default(DEFAULT_RETENTION),
  /** IANA name; the overview's weeks and the weekly digest count days in it. */
  timeZone: text("time_zone").notNull().default(DEFAULT_SCHOOL_TIME_ZONE),
  createdAt: createdAt(),
});

export const departments = pgTable(
  "departments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("departments_school_name_key").on(t.schoolId, t.name)],
);

export const staffRole = pgEnum("staff_role", STAFF_ROLES);

/**
 * Staff who may sign in. Sign-in matches the verified e-mail address from the identity
 * provider (once), then remembers the provider's subject id. New staff arrive through
 * `staff_invitations`: accepting one creates (or restores) the row.
 */
export const staff = pgTable(
  "staff",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    departmentId: uuid("department_id").references(() => departments.id, { onDelete: "set null" }),
    /** Stored lower-case. */
    email: text("email").notNull(),
    displayName: text("display_name").notNull(),
    role: staffRole("role").notNull(),
    oauthSubject: text("oauth_subject"),
    /** Set when the school removes the account: it can no longer sign in. */
    removedAt: timestamp("removed_at", { withTimezone: true }),
    lastSignInAt: timestamp("last_sign_in_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("staff_email_key").on(t.email),
    uniqueIndex("staff_oauth_subject_key").on(t.oauthSubject),
    index("staff_school_idx").on(t.schoolId),
  ],
);

export const classes = pgTable(
  "classes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    departmentId: uuid("department_id")
      .notNull()
      .references(() => departments.id, { onDelete: "restrict" }),
    teacherId: uuid("teacher_id")
      .notNull()
      .references(() => staff.id, { onDelete: "restrict" }),
    name: text("name").notNull(),
    yearGroup: text("year_group").notNull(),
    subject: text("subject").notNull(),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // A teacher cannot have two current classes with the same name; archived ones may repeat.
    uniqueIndex("classes_teacher_active_name_key")
      .on(t.teacherId, sql`lower(${t.name})`)
      .where(sql`${t.archivedAt} is null`),
    index("classes_department_idx").on(t.departmentId),
  ],
);

/** A class's optional roster: display names only (first name and initial). */
export const rosterEntries = pgTable(
  "roster_entries",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    displayName: text("display_name").notNull(),
    position: integer("position").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("roster_entries_class_name_key").on(t.classId, sql`lower(${t.displayName})`),
    index("roster_entries_class_idx").on(t.classId, t.position),
  ],
);

/**
 * A photo of a real run, uploaded by the class's teacher. The file lives under the uploads
 * folder with a server-made name (`stored_name`, never anything the uploader typed); the type
 * was sniffed from its bytes.
 */
export const benchPhotos = pgTable(
  "bench_photos",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    uploadedBy: uuid("uploaded_by").references(() => staff.id, { onDelete: "set null" }),
    storedName: text("stored_name").notNull(),
    mediaType: text("media_type").$type<PhotoMediaType>().notNull(),
    byteSize: integer("byte_size").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("bench_photos_class_idx").on(t.classId), uniqueIndex("bench_photos_stored_name_key").on(t.storedName)],
);

/**
 * Bench data: one real run's measurements, in SI. Belongs to a class; `lesson_id` is for the
 * live lesson it was recorded in, once those exist. Deleting a photo keeps the runs measured
 * on it (their `photo_id` becomes null): the numbers stay, the picture goes.
 */
export const benchRuns = pgTable(
  "bench_runs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    lessonId: uuid("lesson_id"),
    potHeightM: doublePrecision("pot_height_m").notNull(),
    riseM: doublePrecision("rise_m").notNull(),
    speedMps: doublePrecision("speed_mps"),
    heightUnit: text("height_unit").$type<HeightUnit>().notNull(),
    note: text("note").notNull().default(""),
    source: text("source").$type<BenchSource>().notNull(),
    photoId: uuid("photo_id").references(() => benchPhotos.id, { onDelete: "set null" }),
    /** The five marks (photo pixels) a photo measurement was computed from. */
    photoMarks: jsonb("photo_marks").$type<PhotoMarks>(),
    createdBy: uuid("created_by").references(() => staff.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("bench_runs_class_idx").on(t.classId, t.createdAt)],
);

/**
 * A teacher's plan of trials, reused across lessons. Trials are kept as one checked array (rig,
 * parameters, question) because the plan is always edited and read as a whole. A shared plan can
 * be read and duplicated by colleagues in the owner's department; only the owner edits it.
 */
export const lessonPlans = pgTable(
  "lesson_plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    /** The owner's department when the plan was saved: sharing reaches this department only. */
    departmentId: uuid("department_id").references(() => departments.id, { onDelete: "set null" }),
    ownerId: uuid("owner_id")
      .notNull()
      .references(() => staff.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    /** The teacher's own aim and notes for the plan. */
    summary: text("summary").notNull().default(""),
    trials: jsonb("trials").$type<TrialSetup[]>().notNull(),
    shared: boolean("shared").notNull().default(false),
    /** The plan this one was duplicated from, if any (kept as a plain id: the original may go). */
    copiedFromId: uuid("copied_from_id"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("lesson_plans_owner_idx").on(t.ownerId, t.updatedAt),
    index("lesson_plans_shared_idx").on(t.departmentId).where(sql`${t.shared}`),
  ],
);

/**
 * A lesson the teacher has put in the diary for a class (optionally with a plan), so home can
 * show what comes next and start it in one click. Starting it links the live lesson.
 */
export const plannedLessons = pgTable(
  "planned_lessons",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    teacherId: uuid("teacher_id")
      .notNull()
      .references(() => staff.id, { onDelete: "cascade" }),
    planId: uuid("plan_id").references(() => lessonPlans.id, { onDelete: "set null" }),
    plannedFor: timestamp("planned_for", { withTimezone: true }).notNull(),
    lessonId: uuid("lesson_id").references(() => lessons.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("planned_lessons_teacher_idx").on(t.teacherId, t.plannedFor)],
);

/**
 * A live lesson: one class, its teacher, a sequence of trials. The code is unique among open
 * lessons only; once a lesson ends its code may be given out again.
 */
export const lessons = pgTable(
  "lessons",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    teacherId: uuid("teacher_id")
      .notNull()
      .references(() => staff.id, { onDelete: "restrict" }),
    code: varchar("code", { length: 6 }).notNull(),
    status: text("status").$type<"open" | "ended">().notNull().default("open"),
    /** Pupils' names on the board: off unless the teacher turns it on for this lesson. */
    showNames: boolean("show_names").notNull().default(false),
    currentTrialId: uuid("current_trial_id"),
    /** The plan the lesson started from, and its title then (shown even if the plan is later deleted). */
    planId: uuid("plan_id").references(() => lessonPlans.id, { onDelete: "set null" }),
    planTitle: text("plan_title"),
    /**
     * How many pupils took part, counted when the lesson ends (pupils cannot join an ended
     * lesson), so the department overview need not count them again; null while open. A count,
     * not pupil data: it stays when the retention purge removes the names.
     */
    participantCount: integer("participant_count"),
    startedAt: timestamp("started_at", { withTimezone: true }).notNull().defaultNow(),
    endedAt: timestamp("ended_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("lessons_open_code_key").on(t.code).where(sql`${t.status} = 'open'`),
    index("lessons_class_idx").on(t.classId, t.startedAt),
    index("lessons_teacher_idx").on(t.teacherId, t.startedAt),
  ],
);

/**
 * A pupil in one lesson: a display name (typed, or picked from the roster) and nothing else.
 * The device keeps a random resume token; only its hash is stored.
 */
export const lessonParticipants = pgTable(
  "lesson_participants",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    lessonId: uuid("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    displayName: text("display_name").notNull(),
    rosterEntryId: uuid("roster_entry_id").references(() => rosterEntries.id, { onDelete: "set null" }),
    resumeTokenHash: text("resume_token_hash").notNull(),
    joinedAt: timestamp("joined_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("lesson_participants_name_key").on(t.lessonId, sql`lower(${t.displayName})`),
    uniqueIndex("lesson_participants_token_key").on(t.resumeTokenHash),
  ],
);

/**
 * One predict → observe → explain cycle on one rig with fixed parameters. The board's
 * simulation records what it measured (SI) with the seed; the theory is worked out by the server.
 */
export const trials = pgTable(
  "trials",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    lessonId: uuid("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    rig: text("rig").notNull(),
    params: jsonb("params").$type<Record<string, unknown>>().notNull(),
    question: jsonb("question").$type<Question>().notNull(),
    phase: text("phase").$type<TrialPhase>().notNull().default("setup"),
    seed: integer("seed"),
    measured: jsonb("measured").$type<Record<string, { value: number; uncertainty: number; unit: string; basis: string }>>(),
    theory: jsonb("theory").$type<TheoryValues>(),
    run: jsonb("run").$type<{ dt: number; steps: number; simulatedSeconds: number; wallSeconds: number | null }>(),
    tallyFirst: jsonb("tally_first").$type<Tally>(),
    tallySecond: jsonb("tally_second").$type<Tally>(),
    ranAt: timestamp("ran_at", { withTimezone: true }),
    /**
     * How close the class's round-1 number predictions were to the recorded result, kept with the
     * trial so the department overview need not read every prediction (server/department/
     * trial-summary.ts writes them whenever a result is recorded). Null until a number question
     * has a result. Counts only: no pupil's answer can be read back from them.
     */
    summaryPredictions: integer("summary_predictions"),
    /** Of those, how many were within 10 % of the result. */
    summaryWithin10: integer("summary_within10"),
    /** Median over the class of |prediction − result| / |result|; null when the result is 0 or nobody answered. */
    summaryMedianRelError: doublePrecision("summary_median_rel_error"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("trials_lesson_position_key").on(t.lessonId, t.position)],
);

/**
 * A pupil's answer for one round of a trial (1: before the run, 2: the re-vote). One per pupil
 * and round: answering again replaces it. `client_id` comes from the device, so a resend after a
 * lost acknowledgement finds the stored row instead of adding another.
 */
export const predictions = pgTable(
  "predictions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    trialId: uuid("trial_id")
      .notNull()
      .references(() => trials.id, { onDelete: "cascade" }),
    participantId: uuid("participant_id")
      .notNull()
      .references(() => lessonParticipants.id, { onDelete: "cascade" }),
    round: integer("round").$type<1 | 2>().notNull(),
    clientId: uuid("client_id").notNull(),
    /**
     * Client ids of the answers this row replaced, so a late resend of one of them is
     * acknowledged as stored instead of overwriting the newer answer.
     */
    replacedClientIds: uuid("replaced_client_ids").array().notNull().default(sql`'{}'::uuid[]`),
    /** In the question's unit, as typed. */
    value: doublePrecision("value"),
    choice: integer("choice"),
    reason: text("reason").notNull().default(""),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("predictions_trial_participant_round_key").on(t.trialId, t.participantId, t.round),
    uniqueIndex("predictions_participant_client_key").on(t.participantId, t.clientId),
  ],
);

/** A pupil's explanation after the run; the teacher chooses which to show on the board (never with names). */
export const explanations = pgTable(
  "explanations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    trialId: uuid("trial_id")
      .notNull()
      .references(() => trials.id, { onDelete: "cascade" }),
    participantId: uuid("participant_id")
      .notNull()
      .references(() => lessonParticipants.id, { onDelete: "cascade" }),
    clientId: uuid("client_id").notNull(),
    text: text("text").notNull(),
    shownAt: timestamp("shown_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("explanations_participant_client_key").on(t.participantId, t.clientId),
    index("explanations_trial_idx").on(t.trialId),
  ],
);

/**
 * One weekly digest sent to one head of department for one week. The unique key makes a send
 * happen once per person and week, whatever restarts or second servers do.
 */
export const weeklyDigestSends = pgTable(
  "weekly_digest_sends",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    staffId: uuid("staff_id")
      .notNull()
      .references(() => staff.id, { onDelete: "cascade" }),
    /** Monday 00:00 UTC of the week reported. */
    weekStart: timestamp("week_start", { withTimezone: true }).notNull(),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("weekly_digest_sends_staff_week_key").on(t.staffId, t.weekStart)],
);

/**
 * An admin's invitation to join the school's staff. Only a hash of the link's token is kept, so
 * a copy of the database cannot be turned into working links. An invitation is open while it is
 * neither accepted nor cancelled; past `expires_at` it can only be resent (with a new token).
 */
export const staffInvitations = pgTable(
  "staff_invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    departmentId: uuid("department_id").references(() => departments.id, { onDelete: "cascade" }),
    /** Stored lower-case. */
    email: text("email").notNull(),
    displayName: text("display_name").notNull(),
    role: staffRole("role").notNull(),
    tokenHash: text("token_hash").notNull(),
    invitedByStaffId: uuid("invited_by_staff_id").references(() => staff.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    /** When the mail server last took the message; null if it never has. */
    lastSentAt: timestamp("last_sent_at", { withTimezone: true }),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    acceptedStaffId: uuid("accepted_staff_id").references(() => staff.id, { onDelete: "set null" }),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("staff_invitations_token_hash_key").on(t.tokenHash),
    // One open invitation per address and school: a second would leave two live links.
    uniqueIndex("staff_invitations_open_email_key")
      .on(t.schoolId, t.email)
      .where(sql`${t.acceptedAt} is null and ${t.cancelledAt} is null`),
    index("staff_invitations_email_idx").on(t.email),
  ],
);

/**
 * One row per run of the retention purge. What a run deleted is counted in `purge_deletions`;
 * the deleted data itself is never copied anywhere.
 */
export const purgeRuns = pgTable(
  "purge_runs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** `schedule` (the timer), `start-up` (a missed run caught up) or `manual` (tests, scripts). */
    trigger: text("trigger").$type<"schedule" | "start-up" | "manual">().notNull(),
    startedAt: timestamp("started_at", { withTimezone: true }).notNull(),
    finishedAt: timestamp("finished_at", { withTimezone: true }),
    status: text("status").$type<"succeeded" | "failed">().notNull(),
    /** For the server log only; never sent to a client. */
    error: text("error"),
  },
  (t) => [index("purge_runs_started_idx").on(t.startedAt)],
);

/** How many rows of one kind a purge run deleted for one school, and by which cutoff. */
export const purgeDeletions = pgTable(
  "purge_deletions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    runId: uuid("run_id")
      .notNull()
      .references(() => purgeRuns.id, { onDelete: "cascade" }),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    kind: text("kind").$type<PupilDataKind>().notNull(),
    retention: retentionPeriod("retention").notNull(),
    cutoff: timestamp("cutoff", { withTimezone: true }).notNull(),
    deletedCount: integer("deleted_count").notNull(),
  },
  (t) => [index("purge_deletions_school_run_idx").on(t.schoolId, t.runId)],
);

/** Who did what to whom, for changes a school may need to account for. */
export const auditEvents = pgTable(
  "audit_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    actorStaffId: uuid("actor_staff_id").references(() => staff.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: uuid("subject_id"),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [index("audit_events_school_created_idx").on(t.schoolId, t.createdAt)],
);

/** express-session rows, in the layout connect-pg-simple expects. */
export const sessions = pgTable(
  "session",
  {
    sid: varchar("sid").primaryKey(),
    sess: json("sess").notNull(),
    expire: timestamp("expire", { precision: 6 }).notNull(),
  },
  (t) => [index("IDX_session_expire").on(t.expire)],
);
