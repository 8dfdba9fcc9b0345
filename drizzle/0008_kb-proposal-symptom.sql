ALTER TYPE "public"."kb_proposal_kind" ADD VALUE 'symptom';--> statement-breakpoint
ALTER TABLE "kb_proposals" ALTER COLUMN "symptom_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD COLUMN "symptom_name" text;--> statement-breakpoint
ALTER TABLE "kb_proposals" ADD CONSTRAINT "kb_proposals_symptom_named" CHECK (("kb_proposals"."symptom_id" is null) <> ("kb_proposals"."symptom_name" is null));