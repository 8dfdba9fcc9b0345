CREATE TABLE "used_sign_in_codes" (
	"code_hash" text PRIMARY KEY NOT NULL,
	"used_at" timestamp with time zone DEFAULT now() NOT NULL
);
