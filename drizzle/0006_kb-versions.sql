CREATE TABLE "kb_versions" (
	"workshop_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"summary" text NOT NULL,
	"made_by_id" uuid,
	"knowledge" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "kb_versions_workshop_id_version_pk" PRIMARY KEY("workshop_id","version")
);
--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "kb_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "kb_versions" ADD CONSTRAINT "kb_versions_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kb_versions" ADD CONSTRAINT "kb_versions_made_by_id_members_id_fk" FOREIGN KEY ("made_by_id") REFERENCES "public"."members"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
-- Cases that exist already are ranked with the version their workshop is at now.
UPDATE "cases" SET "kb_version" = "workshops"."kb_version" FROM "workshops" WHERE "workshops"."id" = "cases"."workshop_id";
