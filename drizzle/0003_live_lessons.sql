CREATE TABLE "explanations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trial_id" uuid NOT NULL,
	"participant_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"text" text NOT NULL,
	"shown_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lesson_participants" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lesson_id" uuid NOT NULL,
	"display_name" text NOT NULL,
	"roster_entry_id" uuid,
	"resume_token_hash" text NOT NULL,
	"joined_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lessons" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"class_id" uuid NOT NULL,
	"teacher_id" uuid NOT NULL,
	"code" varchar(6) NOT NULL,
	"status" text DEFAULT 'open' NOT NULL,
	"show_names" boolean DEFAULT false NOT NULL,
	"current_trial_id" uuid,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ended_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "predictions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trial_id" uuid NOT NULL,
	"participant_id" uuid NOT NULL,
	"round" integer NOT NULL,
	"client_id" uuid NOT NULL,
	"value" double precision,
	"choice" integer,
	"reason" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "trials" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"lesson_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"rig" text NOT NULL,
	"params" jsonb NOT NULL,
	"question" jsonb NOT NULL,
	"phase" text DEFAULT 'setup' NOT NULL,
	"seed" integer,
	"measured" jsonb,
	"theory" jsonb,
	"run" jsonb,
	"tally_first" jsonb,
	"tally_second" jsonb,
	"ran_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "explanations" ADD CONSTRAINT "explanations_trial_id_trials_id_fk" FOREIGN KEY ("trial_id") REFERENCES "public"."trials"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "explanations" ADD CONSTRAINT "explanations_participant_id_lesson_participants_id_fk" FOREIGN KEY ("participant_id") REFERENCES "public"."lesson_participants"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_participants" ADD CONSTRAINT "lesson_participants_lesson_id_lessons_id_fk" FOREIGN KEY ("lesson_id") REFERENCES "public"."lessons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_participants" ADD CONSTRAINT "lesson_participants_roster_entry_id_roster_entries_id_fk" FOREIGN KEY ("roster_entry_id") REFERENCES "public"."roster_entries"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lessons" ADD CONSTRAINT "lessons_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lessons" ADD CONSTRAINT "lessons_teacher_id_staff_id_fk" FOREIGN KEY ("teacher_id") REFERENCES "public"."staff"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "predictions" ADD CONSTRAINT "predictions_trial_id_trials_id_fk" FOREIGN KEY ("trial_id") REFERENCES "public"."trials"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "predictions" ADD CONSTRAINT "predictions_participant_id_lesson_participants_id_fk" FOREIGN KEY ("participant_id") REFERENCES "public"."lesson_participants"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trials" ADD CONSTRAINT "trials_lesson_id_lessons_id_fk" FOREIGN KEY ("lesson_id") REFERENCES "public"."lessons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "explanations_participant_client_key" ON "explanations" USING btree ("participant_id","client_id");--> statement-breakpoint
CREATE INDEX "explanations_trial_idx" ON "explanations" USING btree ("trial_id");--> statement-breakpoint
CREATE UNIQUE INDEX "lesson_participants_name_key" ON "lesson_participants" USING btree ("lesson_id",lower("display_name"));--> statement-breakpoint
CREATE UNIQUE INDEX "lesson_participants_token_key" ON "lesson_participants" USING btree ("resume_token_hash");--> statement-breakpoint
CREATE UNIQUE INDEX "lessons_open_code_key" ON "lessons" USING btree ("code") WHERE "lessons"."status" = 'open';--> statement-breakpoint
CREATE INDEX "lessons_class_idx" ON "lessons" USING btree ("class_id","started_at");--> statement-breakpoint
CREATE INDEX "lessons_teacher_idx" ON "lessons" USING btree ("teacher_id","started_at");--> statement-breakpoint
CREATE UNIQUE INDEX "predictions_trial_participant_round_key" ON "predictions" USING btree ("trial_id","participant_id","round");--> statement-breakpoint
CREATE UNIQUE INDEX "predictions_participant_client_key" ON "predictions" USING btree ("participant_id","client_id");--> statement-breakpoint
CREATE UNIQUE INDEX "trials_lesson_position_key" ON "trials" USING btree ("lesson_id","position");