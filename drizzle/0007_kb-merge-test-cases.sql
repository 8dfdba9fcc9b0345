CREATE TABLE "kb_test_cases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"complaint" text NOT NULL,
	"fuel_type" "fuel_type" NOT NULL,
	"drivetrain" "drivetrain" NOT NULL,
	"year" integer NOT NULL,
	"mileage_km" integer,
	"evidence" jsonb NOT NULL,
	"answer_cause_id" uuid NOT NULL,
	"from_case_id" uuid,
	"kept_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "causes" ADD COLUMN "merged_into_id" uuid;--> statement-breakpoint
ALTER TABLE "kb_test_cases" ADD CONSTRAINT "kb_test_cases_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_test_cases" ADD CONSTRAINT "kb_test_cases_answer_cause_id_causes_id_fk" FOREIGN KEY ("answer_cause_id") REFERENCES "public"."causes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_test_cases" ADD CONSTRAINT "kb_test_cases_from_case_id_cases_id_fk" FOREIGN KEY ("from_case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_test_cases" ADD CONSTRAINT "kb_test_cases_kept_by_id_members_id_fk" FOREIGN KEY ("kept_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "kb_test_cases_workshop_idx" ON "kb_test_cases" USING btree ("workshop_id");--> statement-breakpoint
ALTER TABLE "causes" ADD CONSTRAINT "causes_merged_into_id_causes_id_fk" FOREIGN KEY ("merged_into_id") REFERENCES "public"."causes"("id") ON DELETE set null ON UPDATE no action;