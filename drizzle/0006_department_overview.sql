ALTER TABLE "lessons" ADD COLUMN "participant_count" integer;--> statement-breakpoint
ALTER TABLE "trials" ADD COLUMN "summary_predictions" integer;--> statement-breakpoint
ALTER TABLE "trials" ADD COLUMN "summary_within10" integer;--> statement-breakpoint
ALTER TABLE "trials" ADD COLUMN "summary_median_rel_error" double precision;--> statement-breakpoint
-- Ended lessons before this migration: count their pupils now (server/lessons/lessons.service.ts markEnded does it from now on).
UPDATE "lessons" SET "participant_count" = (SELECT count(*) FROM "lesson_participants" AS p WHERE p."lesson_id" = "lessons"."id") WHERE "status" = 'ended';
--> statement-breakpoint
-- Back-fill for trials recorded before this migration; the same rule as server/department/trial-summary.ts
-- (tests/integration/department-overview.test.ts runs this statement and compares). Predictions are in the
-- question's unit, results SI: DISPLAY_UNITS in server/contracts/lesson-rules.ts gives the factors.
UPDATE "trials" AS t SET
	"summary_predictions" = s.n,
	"summary_within10" = s.within10,
	"summary_median_rel_error" = s.median_rel
FROM (
	SELECT tr."id",
		count(p."value") AS n,
		count(p."value") FILTER (WHERE abs(p."value" - r.result) <= 0.1 * abs(r.result) + 1e-9 * abs(r.result)) AS within10,
		percentile_cont(0.5) WITHIN GROUP (ORDER BY abs(p."value" - r.result) / nullif(abs(r.result), 0)) AS median_rel
	FROM "trials" AS tr
	CROSS JOIN LATERAL (
		SELECT (tr."measured" -> (tr."question" ->> 'quantity') ->> 'value')::double precision
			* (CASE tr."question" ->> 'unit' WHEN 'm' THEN 1 WHEN 'cm' THEN 100 WHEN 'mm' THEN 1000 WHEN 'm/s' THEN 1
				WHEN 'N' THEN 1 WHEN 'mN' THEN 1000 WHEN '' THEN 1 END) AS result
	) AS r
	LEFT JOIN "predictions" AS p ON p."trial_id" = tr."id" AND p."round" = 1 AND p."value" IS NOT NULL
	WHERE tr."question" ->> 'kind' = 'number' AND tr."ran_at" IS NOT NULL AND r.result IS NOT NULL
	GROUP BY tr."id"
) AS s
WHERE t."id" = s."id";
