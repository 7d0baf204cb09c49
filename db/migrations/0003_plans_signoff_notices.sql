CREATE TABLE "plans" (
	"id" text PRIMARY KEY NOT NULL,
	"window_id" text NOT NULL,
	"window_version" integer NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"settings" jsonb NOT NULL,
	"progress" jsonb,
	"result" jsonb,
	"error" text,
	"job_id" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"outage_accepted" text[],
	"accepted_at" timestamp with time zone,
	"accepted_by" text
);
--> statement-breakpoint
CREATE TABLE "notices" (
	"id" text PRIMARY KEY NOT NULL,
	"window_id" text NOT NULL,
	"tenant_id" text NOT NULL,
	"uid" text NOT NULL,
	"sequence" integer DEFAULT 0 NOT NULL,
	"method" text DEFAULT 'REQUEST' NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"subject" text NOT NULL,
	"body" text NOT NULL,
	"content" jsonb NOT NULL,
	"ics" text NOT NULL,
	"lead_override_reason" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"sent_at" timestamp with time zone,
	"acknowledged_at" timestamp with time zone,
	"acknowledged_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "signoffs" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"window_id" text NOT NULL,
	"round" integer NOT NULL,
	"plan_id" text NOT NULL,
	"approver_id" text NOT NULL,
	"decision" text NOT NULL,
	"comment" text,
	"code_confirmed" boolean DEFAULT false NOT NULL,
	"decided_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sink_messages" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"envelope_from" text,
	"envelope_to" text[] NOT NULL,
	"subject" text,
	"raw" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"meta" jsonb
);
--> statement-breakpoint
CREATE TABLE "user_otp_keys" (
	"user_id" text PRIMARY KEY NOT NULL,
	"key_base32" text NOT NULL,
	"confirmed_at" timestamp with time zone,
	"last_used_step" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "windows" ADD COLUMN "accepted_plan_id" text;--> statement-breakpoint
ALTER TABLE "windows" ADD COLUMN "review_round" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_window_id_windows_id_fk" FOREIGN KEY ("window_id") REFERENCES "public"."windows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_accepted_by_users_id_fk" FOREIGN KEY ("accepted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notices" ADD CONSTRAINT "notices_window_id_windows_id_fk" FOREIGN KEY ("window_id") REFERENCES "public"."windows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notices" ADD CONSTRAINT "notices_tenant_id_tenants_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."tenants"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notices" ADD CONSTRAINT "notices_acknowledged_by_users_id_fk" FOREIGN KEY ("acknowledged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signoffs" ADD CONSTRAINT "signoffs_window_id_windows_id_fk" FOREIGN KEY ("window_id") REFERENCES "public"."windows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signoffs" ADD CONSTRAINT "signoffs_approver_id_users_id_fk" FOREIGN KEY ("approver_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "user_otp_keys" ADD CONSTRAINT "user_otp_keys_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "plans_window_idx" ON "plans" USING btree ("window_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "notices_window_tenant_key" ON "notices" USING btree ("window_id","tenant_id");--> statement-breakpoint
CREATE INDEX "notices_tenant_idx" ON "notices" USING btree ("tenant_id");--> statement-breakpoint
CREATE UNIQUE INDEX "signoffs_one_per_round_key" ON "signoffs" USING btree ("window_id","round","approver_id");--> statement-breakpoint
CREATE INDEX "sink_messages_received_idx" ON "sink_messages" USING btree ("received_at");