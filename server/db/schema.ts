/**
 * The database schema. `npm run db:generate` turns changes here into SQL migrations in
 * drizzle/, which the server applies once at start-up (see migrate.ts).
 */
import { sql } from "drizzle-orm";
import {
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
import { STAFF_ROLES } from "../contracts/staff-roles";
import type { BenchSource, HeightUnit, PhotoMediaType } from "../contracts/bench";
import type { PhotoMarks } from "../contracts/photo-measure";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();

export const retentionPeriod = pgEnum("retention_period", RETENTION_PERIODS);

export const schools = pgTable("schools", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  /** How long pupil data is kept before the scheduled purge deletes it. */
  pupilDataRetention: retentionPeriod("pupil_data_retention").notNull().default(DEFAULT_RETENTION),
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
