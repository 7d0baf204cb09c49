CREATE TABLE "sign_in_failures" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"key_kind" text NOT NULL,
	"key" text NOT NULL,
	"at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
ALTER TABLE "sessions" ADD COLUMN "user_agent" text;--> statement-breakpoint
ALTER TABLE "sessions" ADD COLUMN "address" text;--> statement-breakpoint
CREATE INDEX "sign_in_failures_key_idx" ON "sign_in_failures" USING btree ("key_kind","key","at");--> statement-breakpoint
CREATE INDEX "sign_in_failures_at_idx" ON "sign_in_failures" USING btree ("at");