CREATE TYPE "public"."kb_proposal_kind" AS ENUM('link', 'cause');--> statement-breakpoint
CREATE TYPE "public"."kb_proposal_state" AS ENUM('open', 'accepted', 'rejected');--> statement-breakpoint
CREATE TABLE "kb_proposals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid,
	"kind" "kb_proposal_kind" NOT NULL,
	"symptom_id" uuid NOT NULL,
	"cause_id" uuid NOT NULL,
	"cause_name" text,
	"p" double precision NOT NULL,
	"note" text NOT NULL,
	"state" "kb_proposal_state" DEFAULT 'open' NOT NULL,
	"proposed_by_id" uuid,
	"reviewed_by_id" uuid,
	"review_comment" text,
	"reviewed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "kb_proposals_p_range" CHECK ("kb_proposals"."p" > 0 and "kb_proposals"."p" < 1),
	CONSTRAINT "kb_proposals_cause_named" CHECK (("kb_proposals"."kind" = 'cause') = ("kb_proposals"."cause_name" is not null))
);
--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_symptom_id_symptoms_id_fk" FOREIGN KEY ("symptom_id") REFERENCES "public"."symptoms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_proposed_by_id_members_id_fk" FOREIGN KEY ("proposed_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_reviewed_by_id_members_id_fk" FOREIGN KEY ("reviewed_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "kb_proposals_workshop_state_idx" ON "kb_proposals" USING btree ("workshop_id","state");