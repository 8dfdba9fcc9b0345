CREATE TYPE "public"."owner_decision" AS ENUM('approved', 'declined');--> statement-breakpoint
CREATE TYPE "public"."estimate_line_kind" AS ENUM('part', 'labour', 'consumable', 'diagnostic_fee', 'discount');--> statement-breakpoint
CREATE TYPE "public"."mail_state" AS ENUM('queued', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."payment_purpose" AS ENUM('diagnostic_fee', 'deposit');--> statement-breakpoint
CREATE TYPE "public"."payment_status" AS ENUM('open', 'paid', 'refunded', 'flagged');--> statement-breakpoint
CREATE TABLE "estimate_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid NOT NULL,
	"title" text NOT NULL,
	"cause_id" uuid,
	"priority" "priority_level" NOT NULL,
	"required" boolean DEFAULT false NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "estimate_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"item_id" uuid NOT NULL,
	"kind" "estimate_line_kind" NOT NULL,
	"description" text NOT NULL,
	"part_number" text,
	"quantity_milli" integer NOT NULL,
	"unit_minor" integer NOT NULL,
	"tax_rate_bp" integer NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "estimate_lines_quantity_pos" CHECK ("estimate_lines"."quantity_milli" > 0),
	CONSTRAINT "estimate_lines_rate_range" CHECK ("estimate_lines"."tax_rate_bp" between 0 and 9999),
	CONSTRAINT "estimate_lines_sign" CHECK (("estimate_lines"."kind" = 'discount') = ("estimate_lines"."unit_minor" < 0) or "estimate_lines"."unit_minor" = 0)
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid,
	"case_id" uuid,
	"kind" text NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"state" "mail_state" DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "owner_decisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sent_estimate_id" uuid NOT NULL,
	"item_id" text NOT NULL,
	"decision" "owner_decision" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "owner_decisions_item" UNIQUE("sent_estimate_id","item_id")
);
--> statement-breakpoint
CREATE TABLE "owner_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"sent_estimate_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"revoked_by_id" uuid,
	"first_opened_at" timestamp with time zone,
	"last_opened_at" timestamp with time zone,
	"open_count" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "owner_links_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"session_id" text,
	"payload" jsonb NOT NULL,
	"outcome" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid NOT NULL,
	"sent_estimate_id" uuid NOT NULL,
	"purpose" "payment_purpose" NOT NULL,
	"amount_minor" integer NOT NULL,
	"currency" text NOT NULL,
	"status" "payment_status" DEFAULT 'open' NOT NULL,
	"checkout_session_id" text,
	"payment_intent_id" text,
	"flagged_reason" text,
	"paid_at" timestamp with time zone,
	"refunded_at" timestamp with time zone,
	"refund_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "payments_checkout_session_id_unique" UNIQUE("checkout_session_id"),
	CONSTRAINT "payments_amount_pos" CHECK ("payments"."amount_minor" > 0)
);
--> statement-breakpoint
CREATE TABLE "sent_estimates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"document" jsonb NOT NULL,
	"to_email" text NOT NULL,
	"sent_by_id" uuid,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL,
	"answered_at" timestamp with time zone,
	"owner_note" text,
	CONSTRAINT "sent_estimates_case_version" UNIQUE("case_id","version")
);
--> statement-breakpoint
ALTER TABLE "workshops" ADD COLUMN "prices_include_tax" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "estimate_items" ADD CONSTRAINT "estimate_items_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_items" ADD CONSTRAINT "estimate_items_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_items" ADD CONSTRAINT "estimate_items_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_item_id_estimate_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."estimate_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "owner_decisions" ADD CONSTRAINT "owner_decisions_sent_estimate_id_sent_estimates_id_fk" FOREIGN KEY ("sent_estimate_id") REFERENCES "public"."sent_estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "owner_links" ADD CONSTRAINT "owner_links_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "owner_links" ADD CONSTRAINT "owner_links_sent_estimate_id_sent_estimates_id_fk" FOREIGN KEY ("sent_estimate_id") REFERENCES "public"."sent_estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "owner_links" ADD CONSTRAINT "owner_links_revoked_by_id_members_id_fk" FOREIGN KEY ("revoked_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_sent_estimate_id_sent_estimates_id_fk" FOREIGN KEY ("sent_estimate_id") REFERENCES "public"."sent_estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_estimates" ADD CONSTRAINT "sent_estimates_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_estimates" ADD CONSTRAINT "sent_estimates_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_estimates" ADD CONSTRAINT "sent_estimates_sent_by_id_members_id_fk" FOREIGN KEY ("sent_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "estimate_items_case_idx" ON "estimate_items" USING btree ("case_id");--> statement-breakpoint
CREATE INDEX "estimate_lines_item_idx" ON "estimate_lines" USING btree ("item_id");--> statement-breakpoint
CREATE INDEX "mail_outbox_state_idx" ON "mail_outbox" USING btree ("state","created_at");--> statement-breakpoint
CREATE INDEX "owner_links_sent_idx" ON "owner_links" USING btree ("sent_estimate_id");--> statement-breakpoint
CREATE INDEX "payments_case_idx" ON "payments" USING btree ("case_id");