CREATE TABLE "bench_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"class_id" uuid NOT NULL,
	"uploaded_by" uuid,
	"stored_name" text NOT NULL,
	"media_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bench_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"class_id" uuid NOT NULL,
	"lesson_id" uuid,
	"pot_height_m" double precision NOT NULL,
	"rise_m" double precision NOT NULL,
	"speed_mps" double precision,
	"height_unit" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"source" text NOT NULL,
	"photo_id" uuid,
	"photo_marks" jsonb,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "bench_photos" ADD CONSTRAINT "bench_photos_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_photos" ADD CONSTRAINT "bench_photos_uploaded_by_staff_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."staff"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_runs" ADD CONSTRAINT "bench_runs_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_runs" ADD CONSTRAINT "bench_runs_photo_id_bench_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."bench_photos"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bench_runs" ADD CONSTRAINT "bench_runs_created_by_staff_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."staff"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bench_photos_class_idx" ON "bench_photos" USING btree ("class_id");--> statement-breakpoint
CREATE UNIQUE INDEX "bench_photos_stored_name_key" ON "bench_photos" USING btree ("stored_name");--> statement-breakpoint
CREATE INDEX "bench_runs_class_idx" ON "bench_runs" USING btree ("class_id","created_at");