ALTER TABLE "campaigns" ADD COLUMN "job_id" text;--> statement-breakpoint
ALTER TABLE "slot_searches" ADD COLUMN "job_id" text;