CREATE TYPE "public"."retention_period" AS ENUM('end_of_school_year', 'days_90', 'days_30');--> statement-breakpoint
CREATE TABLE "purge_deletions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"run_id" uuid NOT NULL,
	"school_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"retention" "retention_period" NOT NULL,
	"cutoff" timestamp with time zone NOT NULL,
	"deleted_count" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "purge_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trigger" text NOT NULL,
	"started_at" timestamp with time zone NOT NULL,
	"finished_at" timestamp with time zone,
	"status" text NOT NULL,
	"error" text
);
--> statement-breakpoint
CREATE TABLE "staff_invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"school_id" uuid NOT NULL,
	"department_id" uuid,
	"email" text NOT NULL,
	"display_name" text NOT NULL,
	"role" "staff_role" NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by_staff_id" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"last_sent_at" timestamp with time zone,
	"accepted_at" timestamp with time zone,
	"accepted_staff_id" uuid,
	"cancelled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "schools" ADD COLUMN "pupil_data_retention" "retention_period" DEFAULT 'end_of_school_year' NOT NULL;--> statement-breakpoint
ALTER TABLE "purge_deletions" ADD CONSTRAINT "purge_deletions_run_id_purge_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."purge_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purge_deletions" ADD CONSTRAINT "purge_deletions_school_id_schools_id_fk" FOREIGN KEY ("school_id") REFERENCES "public"."schools"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_invitations" ADD CONSTRAINT "staff_invitations_school_id_schools_id_fk" FOREIGN KEY ("school_id") REFERENCES "public"."schools"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_invitations" ADD CONSTRAINT "staff_invitations_department_id_departments_id_fk" FOREIGN KEY ("department_id") REFERENCES "public"."departments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_invitations" ADD CONSTRAINT "staff_invitations_invited_by_staff_id_staff_id_fk" FOREIGN KEY ("invited_by_staff_id") REFERENCES "public"."staff"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_invitations" ADD CONSTRAINT "staff_invitations_accepted_staff_id_staff_id_fk" FOREIGN KEY ("accepted_staff_id") REFERENCES "public"."staff"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "purge_deletions_school_run_idx" ON "purge_deletions" USING btree ("school_id","run_id");--> statement-breakpoint
CREATE INDEX "purge_runs_started_idx" ON "purge_runs" USING btree ("started_at");--> statement-breakpoint
CREATE UNIQUE INDEX "staff_invitations_token_hash_key" ON "staff_invitations" USING btree ("token_hash");--> statement-breakpoint
CREATE UNIQUE INDEX "staff_invitations_open_email_key" ON "staff_invitations" USING btree ("school_id","email") WHERE "staff_invitations"."accepted_at" is null and "staff_invitations"."cancelled_at" is null;--> statement-breakpoint
CREATE INDEX "staff_invitations_email_idx" ON "staff_invitations" USING btree ("email");