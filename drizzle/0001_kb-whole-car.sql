-- The starter knowledge base covers the whole car: two new systems, the symptom kinds renamed and
-- extended, owner-facing words on causes and the trouble code on symptoms.
-- Hand-edited after drizzle-kit generate: drizzle-kit recreated symptom_kind (cast through text),
-- which fails on rows that still hold an old value. Renaming keeps every existing row valid; the
-- end state is the one in meta/0001_snapshot.json. No statement here uses a value added here
-- (ALTER TYPE … ADD VALUE must not be used in the same transaction as the new value).
ALTER TYPE "public"."vehicle_system" ADD VALUE 'engine_mechanical' BEFORE 'cooling';--> statement-breakpoint
ALTER TYPE "public"."vehicle_system" ADD VALUE 'body';--> statement-breakpoint
ALTER TYPE "public"."symptom_kind" RENAME VALUE 'handling' TO 'pull';--> statement-breakpoint
ALTER TYPE "public"."symptom_kind" RENAME VALUE 'warning_light' TO 'warning_lamp';--> statement-breakpoint
ALTER TYPE "public"."symptom_kind" RENAME VALUE 'visual' TO 'visible';--> statement-breakpoint
ALTER TYPE "public"."symptom_kind" ADD VALUE 'trouble_code' AFTER 'warning_lamp';--> statement-breakpoint
ALTER TYPE "public"."symptom_kind" ADD VALUE 'consumption' AFTER 'leak';--> statement-breakpoint
ALTER TABLE "causes" ADD COLUMN "owner_description" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "causes" ADD COLUMN "if_left" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "symptoms" ADD COLUMN "code" text;
