/**
 * The database schema. `npm run db:generate` turns changes here into SQL migrations in
 * drizzle/, which the server applies once at start-up (see migrate.ts).
 */
import { sql } from "drizzle-orm";
import {
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
import { STAFF_ROLES } from "../contracts/staff-roles";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();

export const schools = pgTable("schools", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
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
 * Staff who may sign in. A row is the invitation: sign-in matches the verified e-mail
 * address from the identity provider, then remembers the provider's subject id.
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
