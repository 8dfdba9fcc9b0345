CREATE TYPE "public"."case_state" AS ENUM('open', 'awaiting_signoff', 'concluded', 'closed');--> statement-breakpoint
CREATE TYPE "public"."cause_level" AS ENUM('system', 'component', 'failure_mode');--> statement-breakpoint
CREATE TYPE "public"."drivetrain" AS ENUM('fwd', 'rwd', 'awd');--> statement-breakpoint
CREATE TYPE "public"."finding_result" AS ENUM('pass', 'fail');--> statement-breakpoint
CREATE TYPE "public"."fuel_type" AS ENUM('petrol', 'diesel', 'hybrid', 'electric', 'lpg');--> statement-breakpoint
CREATE TYPE "public"."member_status" AS ENUM('active', 'suspended');--> statement-breakpoint
CREATE TYPE "public"."observation_source" AS ENUM('owner', 'technician');--> statement-breakpoint
CREATE TYPE "public"."priority_level" AS ENUM('stop', 'soon', 'watch', 'sound');--> statement-breakpoint
CREATE TYPE "public"."check_result_kind" AS ENUM('pass_fail', 'measurement');--> statement-breakpoint
CREATE TYPE "public"."member_role" AS ENUM('apprentice', 'technician', 'senior', 'advisor', 'admin');--> statement-breakpoint
CREATE TYPE "public"."skill_level" AS ENUM('apprentice', 'technician', 'senior');--> statement-breakpoint
CREATE TYPE "public"."symptom_kind" AS ENUM('noise', 'vibration', 'handling', 'warning_light', 'performance', 'leak', 'smell', 'visual', 'electrical');--> statement-breakpoint
CREATE TYPE "public"."vehicle_system" AS ENUM('brakes', 'suspension_steering', 'wheels_tyres', 'driveline', 'engine_fuel_emissions', 'cooling', 'electrical', 'exhaust');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TABLE "workshops" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"country" char(2) NOT NULL,
	"currency" char(3) NOT NULL,
	"tax_rate" numeric(5, 4) NOT NULL,
	"units" "unit_system" DEFAULT 'metric' NOT NULL,
	"labour_rate_per_hour" numeric(10, 2) NOT NULL,
	"kb_version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "workshops_slug_unique" UNIQUE("slug"),
	CONSTRAINT "workshops_tax_rate_range" CHECK ("workshops"."tax_rate" >= 0 and "workshops"."tax_rate" < 1),
	CONSTRAINT "workshops_labour_rate_nonneg" CHECK ("workshops"."labour_rate_per_hour" >= 0),
	CONSTRAINT "workshops_country_upper" CHECK ("workshops"."country" ~ '^[A-Z]{2}$'),
	CONSTRAINT "workshops_currency_upper" CHECK ("workshops"."currency" ~ '^[A-Z]{3}$')
);
--> statement-breakpoint
CREATE TABLE "identities" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"provider" text NOT NULL,
	"provider_user_id" text NOT NULL,
	"login" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "identities_provider_user" UNIQUE("provider","provider_user_id")
);
--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"email" text,
	"github_login" text,
	"role" "member_role" NOT NULL,
	"invited_by" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "invitations_target" CHECK ("invitations"."email" is not null or "invitations"."github_login" is not null)
);
--> statement-breakpoint
CREATE TABLE "members" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"role" "member_role" NOT NULL,
	"skill" "skill_level" DEFAULT 'technician' NOT NULL,
	"status" "member_status" DEFAULT 'active' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "members_user_unique" UNIQUE("user_id")
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"token_hash" text PRIMARY KEY NOT NULL,
	"user_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"last_seen_at" timestamp with time zone DEFAULT now() NOT NULL,
	"user_agent" text
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "sign_in_attempts_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"bucket" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"email" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mileage_readings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"km" integer NOT NULL,
	"read_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "mileage_nonneg" CHECK ("mileage_readings"."km" >= 0)
);
--> statement-breakpoint
CREATE TABLE "owners" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"email" text,
	"phone" text,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "vehicles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"owner_id" uuid NOT NULL,
	"vin" text,
	"registration" text NOT NULL,
	"make" text NOT NULL,
	"model" text NOT NULL,
	"year" integer NOT NULL,
	"engine" text,
	"fuel_type" "fuel_type" NOT NULL,
	"drivetrain" "drivetrain" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vehicles_workshop_registration" UNIQUE("workshop_id","registration"),
	CONSTRAINT "vehicles_vin_format" CHECK ("vehicles"."vin" is null or "vehicles"."vin" ~ '^[A-HJ-NPR-Z0-9]{17}$'),
	CONSTRAINT "vehicles_year_range" CHECK ("vehicles"."year" between 1886 and 2100)
);
--> statement-breakpoint
CREATE TABLE "causes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"key" text NOT NULL,
	"parent_id" uuid,
	"level" "cause_level" NOT NULL,
	"name" text NOT NULL,
	"system" "vehicle_system" NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"base_rate" double precision,
	"repair_minutes" integer,
	"parts_cost" numeric(10, 2),
	"priority" "priority_level",
	"applicability" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "causes_workshop_key" UNIQUE("workshop_id","key"),
	CONSTRAINT "causes_root_is_system" CHECK (("causes"."parent_id" is null) = ("causes"."level" = 'system')),
	CONSTRAINT "causes_leaf_figures" CHECK (("causes"."level" = 'failure_mode') = ("causes"."base_rate" is not null and "causes"."priority" is not null)),
	CONSTRAINT "causes_base_rate_pos" CHECK ("causes"."base_rate" is null or "causes"."base_rate" > 0),
	CONSTRAINT "causes_costs_nonneg" CHECK (coalesce("causes"."repair_minutes", 0) >= 0 and coalesce("causes"."parts_cost", 0) >= 0)
);
--> statement-breakpoint
CREATE TABLE "check_links" (
	"workshop_id" uuid NOT NULL,
	"check_id" uuid NOT NULL,
	"cause_id" uuid NOT NULL,
	"p_fail" double precision NOT NULL,
	CONSTRAINT "check_links_check_id_cause_id_pk" PRIMARY KEY("check_id","cause_id"),
	CONSTRAINT "check_links_p_range" CHECK ("check_links"."p_fail" >= 0 and "check_links"."p_fail" <= 1)
);
--> statement-breakpoint
CREATE TABLE "checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"key" text NOT NULL,
	"name" text NOT NULL,
	"instructions" text[] DEFAULT '{}'::text[] NOT NULL,
	"tools" text[] DEFAULT '{}'::text[] NOT NULL,
	"minutes" integer NOT NULL,
	"consumables_cost" numeric(10, 2) DEFAULT 0 NOT NULL,
	"access" text[] DEFAULT '{}'::text[] NOT NULL,
	"skill" "skill_level" NOT NULL,
	"cautions" text[] DEFAULT '{}'::text[] NOT NULL,
	"result_kind" "check_result_kind" NOT NULL,
	"quantity" text,
	"unit" text,
	"rule" text,
	"fail_means" text DEFAULT '' NOT NULL,
	"false_alarm" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "checks_workshop_key" UNIQUE("workshop_id","key"),
	CONSTRAINT "checks_false_alarm_range" CHECK ("checks"."false_alarm" >= 0 and "checks"."false_alarm" <= 1),
	CONSTRAINT "checks_costs_nonneg" CHECK ("checks"."minutes" >= 0 and "checks"."consumables_cost" >= 0),
	CONSTRAINT "checks_measurement_rule" CHECK ("checks"."result_kind" = 'pass_fail' or ("checks"."rule" is not null and "checks"."unit" is not null))
);
--> statement-breakpoint
CREATE TABLE "symptom_links" (
	"workshop_id" uuid NOT NULL,
	"symptom_id" uuid NOT NULL,
	"cause_id" uuid NOT NULL,
	"p" double precision NOT NULL,
	CONSTRAINT "symptom_links_symptom_id_cause_id_pk" PRIMARY KEY("symptom_id","cause_id"),
	CONSTRAINT "symptom_links_p_range" CHECK ("symptom_links"."p" >= 0 and "symptom_links"."p" <= 1)
);
--> statement-breakpoint
CREATE TABLE "symptoms" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"key" text NOT NULL,
	"name" text NOT NULL,
	"synonyms" text[] DEFAULT '{}'::text[] NOT NULL,
	"system" "vehicle_system" NOT NULL,
	"kind" "symptom_kind" NOT NULL,
	"conditions" text[] DEFAULT '{}'::text[] NOT NULL,
	"leak" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "symptoms_workshop_key" UNIQUE("workshop_id","key"),
	CONSTRAINT "symptoms_leak_range" CHECK ("symptoms"."leak" >= 0 and "symptoms"."leak" <= 1)
);
--> statement-breakpoint
CREATE TABLE "cases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"complaint" text NOT NULL,
	"mileage_km" integer,
	"state" "case_state" DEFAULT 'open' NOT NULL,
	"assigned_member_id" uuid,
	"opened_by_id" uuid,
	"needs_senior" boolean DEFAULT false NOT NULL,
	"conclusion_cause_id" uuid,
	"conclusion_notes" text,
	"concluded_by_id" uuid,
	"signed_off_by_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"opened_at" timestamp with time zone DEFAULT now() NOT NULL,
	"concluded_at" timestamp with time zone,
	"closed_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "cases_workshop_number" UNIQUE("workshop_id","number"),
	CONSTRAINT "cases_mileage_nonneg" CHECK ("cases"."mileage_km" is null or "cases"."mileage_km" >= 0),
	CONSTRAINT "cases_conclusion_has_cause" CHECK ("cases"."state" in ('open') or "cases"."conclusion_cause_id" is not null)
);
--> statement-breakpoint
CREATE TABLE "findings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid NOT NULL,
	"check_id" uuid NOT NULL,
	"result" "finding_result" NOT NULL,
	"reading" text,
	"value" double precision,
	"unit" text,
	"note" text,
	"recorded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "findings_case_check" UNIQUE("case_id","check_id")
);
--> statement-breakpoint
CREATE TABLE "observations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"case_id" uuid NOT NULL,
	"symptom_id" uuid NOT NULL,
	"present" boolean NOT NULL,
	"source" "observation_source" DEFAULT 'technician' NOT NULL,
	"note" text,
	"recorded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "observations_case_symptom" UNIQUE("case_id","symptom_id")
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "audit_log_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"workshop_id" uuid,
	"actor_user_id" uuid,
	"action" text NOT NULL,
	"entity" text NOT NULL,
	"entity_id" text,
	"before" jsonb,
	"after" jsonb,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "identities" ADD CONSTRAINT "identities_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_members_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "members" ADD CONSTRAINT "members_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "members" ADD CONSTRAINT "members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mileage_readings" ADD CONSTRAINT "mileage_readings_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mileage_readings" ADD CONSTRAINT "mileage_readings_vehicle_id_vehicles_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "owners" ADD CONSTRAINT "owners_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicles" ADD CONSTRAINT "vehicles_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicles" ADD CONSTRAINT "vehicles_owner_id_owners_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."owners"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "causes" ADD CONSTRAINT "causes_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "causes" ADD CONSTRAINT "causes_parent_id_causes_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."causes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_links" ADD CONSTRAINT "check_links_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_links" ADD CONSTRAINT "check_links_check_id_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."checks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_links" ADD CONSTRAINT "check_links_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "checks" ADD CONSTRAINT "checks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_links" ADD CONSTRAINT "symptom_links_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_links" ADD CONSTRAINT "symptom_links_symptom_id_symptoms_id_fk" FOREIGN KEY ("symptom_id") REFERENCES "public"."symptoms"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_links" ADD CONSTRAINT "symptom_links_cause_id_causes_id_fk" FOREIGN KEY ("cause_id") REFERENCES "public"."causes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptoms" ADD CONSTRAINT "symptoms_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_vehicle_id_vehicles_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_assigned_member_id_members_id_fk" FOREIGN KEY ("assigned_member_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_opened_by_id_members_id_fk" FOREIGN KEY ("opened_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_conclusion_cause_id_causes_id_fk" FOREIGN KEY ("conclusion_cause_id") REFERENCES "public"."causes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_concluded_by_id_members_id_fk" FOREIGN KEY ("concluded_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_signed_off_by_id_members_id_fk" FOREIGN KEY ("signed_off_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_check_id_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."checks"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_recorded_by_id_members_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "observations" ADD CONSTRAINT "observations_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "observations" ADD CONSTRAINT "observations_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "observations" ADD CONSTRAINT "observations_symptom_id_symptoms_id_fk" FOREIGN KEY ("symptom_id") REFERENCES "public"."symptoms"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "observations" ADD CONSTRAINT "observations_recorded_by_id_members_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_log" ADD CONSTRAINT "audit_log_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_log" ADD CONSTRAINT "audit_log_actor_user_id_users_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "identities_user_idx" ON "identities" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "invitations_workshop_idx" ON "invitations" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "members_workshop_idx" ON "members" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sessions_expiry_idx" ON "sessions" USING btree ("expires_at");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_bucket_at_idx" ON "sign_in_attempts" USING btree ("bucket","at");--> statement-breakpoint
CREATE INDEX "mileage_vehicle_idx" ON "mileage_readings" USING btree ("vehicle_id","read_at");--> statement-breakpoint
CREATE INDEX "owners_workshop_idx" ON "owners" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "vehicles_owner_idx" ON "vehicles" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "causes_parent_idx" ON "causes" USING btree ("parent_id");--> statement-breakpoint
CREATE INDEX "check_links_workshop_idx" ON "check_links" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "check_links_cause_idx" ON "check_links" USING btree ("cause_id");--> statement-breakpoint
CREATE INDEX "symptom_links_workshop_idx" ON "symptom_links" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "symptom_links_cause_idx" ON "symptom_links" USING btree ("cause_id");--> statement-breakpoint
CREATE INDEX "cases_workshop_state_idx" ON "cases" USING btree ("workshop_id","state");--> statement-breakpoint
CREATE INDEX "cases_vehicle_idx" ON "cases" USING btree ("vehicle_id");--> statement-breakpoint
CREATE INDEX "audit_workshop_at_idx" ON "audit_log" USING btree ("workshop_id","at");--> statement-breakpoint
CREATE INDEX "audit_entity_idx" ON "audit_log" USING btree ("entity","entity_id");