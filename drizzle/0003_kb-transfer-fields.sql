ALTER TABLE "check_links" ADD COLUMN "graded" jsonb;--> statement-breakpoint
ALTER TABLE "checks" ADD COLUMN "grade_scale" text;--> statement-breakpoint
ALTER TABLE "symptom_links" ADD COLUMN "when" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "symptoms" ADD COLUMN "unlisted" double precision;--> statement-breakpoint
ALTER TABLE "symptoms" ADD CONSTRAINT "symptoms_unlisted_range" CHECK ("symptoms"."unlisted" is null or ("symptoms"."unlisted" >= 0 and "symptoms"."unlisted" <= 1));