CREATE TABLE "password_credentials" (
	"user_id" text PRIMARY KEY NOT NULL,
	"password_hash" text NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "role_grants" (
	"user_id" text NOT NULL,
	"role" text NOT NULL,
	"granted_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "role_grants_user_id_role_pk" PRIMARY KEY("user_id","role")
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" text PRIMARY KEY NOT NULL,
	"secret_hash" text NOT NULL,
	"user_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_active_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"tenant_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "placements" (
	"slice_id" text NOT NULL,
	"revision" integer NOT NULL,
	"current" boolean DEFAULT true NOT NULL,
	"sites" jsonb NOT NULL,
	"paths" jsonb NOT NULL,
	"reason" text DEFAULT 'import' NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "placements_slice_id_revision_pk" PRIMARY KEY("slice_id","revision")
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"lat" double precision NOT NULL,
	"lon" double precision NOT NULL,
	"cpu" double precision NOT NULL,
	"mtbf_hours" double precision,
	"mttr_hours" double precision
);
--> statement-breakpoint
CREATE TABLE "slice_functions" (
	"id" text PRIMARY KEY NOT NULL,
	"slice_id" text NOT NULL,
	"name" text,
	"cpu" double precision NOT NULL,
	"anchor" jsonb,
	"move_cost" double precision DEFAULT 1 NOT NULL,
	"fixed" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "slice_ties" (
	"id" text PRIMARY KEY NOT NULL,
	"slice_id" text NOT NULL,
	"from_function" text NOT NULL,
	"to_function" text NOT NULL,
	"bandwidth_gbps" double precision NOT NULL,
	"max_latency_ms" double precision NOT NULL,
	"min_availability" double precision
);
--> statement-breakpoint
CREATE TABLE "slices" (
	"id" text PRIMARY KEY NOT NULL,
	"tenant_id" text NOT NULL,
	"name" text NOT NULL,
	"sst" integer NOT NULL,
	"sd" text,
	"priority" integer NOT NULL,
	"critical" boolean DEFAULT false NOT NULL,
	"status" text DEFAULT 'active' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "spans" (
	"id" text PRIMARY KEY NOT NULL,
	"site_a" text NOT NULL,
	"site_b" text NOT NULL,
	"capacity_gbps" double precision NOT NULL,
	"length_km" double precision NOT NULL,
	"latency_ms" double precision,
	"mtbf_hours" double precision,
	"mttr_hours" double precision,
	"srlg" text[] DEFAULT '{}'::text[] NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tenants" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"notice_days" integer NOT NULL,
	"contacts" jsonb DEFAULT '[]'::jsonb NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"actor_id" text,
	"action" text NOT NULL,
	"entity" text NOT NULL,
	"entity_id" text,
	"before" jsonb,
	"after" jsonb
);
--> statement-breakpoint
CREATE TABLE "freezes" (
	"id" text PRIMARY KEY NOT NULL,
	"title" text NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"reason" text,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "window_elements" (
	"window_id" text NOT NULL,
	"element_kind" text NOT NULL,
	"element_id" text NOT NULL,
	"effect" text NOT NULL,
	"fraction" double precision
);
--> statement-breakpoint
CREATE TABLE "windows" (
	"id" text PRIMARY KEY NOT NULL,
	"title" text NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"ends_at" timestamp with time zone NOT NULL,
	"work_type" text,
	"notes" text,
	"status" text DEFAULT 'draft' NOT NULL,
	"owner_id" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "password_credentials" ADD CONSTRAINT "password_credentials_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "role_grants" ADD CONSTRAINT "role_grants_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_tenant_id_tenants_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."tenants"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placements" ADD CONSTRAINT "placements_slice_id_slices_id_fk" FOREIGN KEY ("slice_id") REFERENCES "public"."slices"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slice_functions" ADD CONSTRAINT "slice_functions_slice_id_slices_id_fk" FOREIGN KEY ("slice_id") REFERENCES "public"."slices"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slice_ties" ADD CONSTRAINT "slice_ties_slice_id_slices_id_fk" FOREIGN KEY ("slice_id") REFERENCES "public"."slices"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slice_ties" ADD CONSTRAINT "slice_ties_from_function_slice_functions_id_fk" FOREIGN KEY ("from_function") REFERENCES "public"."slice_functions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slice_ties" ADD CONSTRAINT "slice_ties_to_function_slice_functions_id_fk" FOREIGN KEY ("to_function") REFERENCES "public"."slice_functions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slices" ADD CONSTRAINT "slices_tenant_id_tenants_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."tenants"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "spans" ADD CONSTRAINT "spans_site_a_sites_id_fk" FOREIGN KEY ("site_a") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "spans" ADD CONSTRAINT "spans_site_b_sites_id_fk" FOREIGN KEY ("site_b") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "freezes" ADD CONSTRAINT "freezes_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "window_elements" ADD CONSTRAINT "window_elements_window_id_windows_id_fk" FOREIGN KEY ("window_id") REFERENCES "public"."windows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "windows" ADD CONSTRAINT "windows_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE UNIQUE INDEX "placements_one_current_key" ON "placements" USING btree ("slice_id") WHERE "placements"."current";--> statement-breakpoint
CREATE INDEX "slice_functions_slice_idx" ON "slice_functions" USING btree ("slice_id");--> statement-breakpoint
CREATE INDEX "slice_ties_slice_idx" ON "slice_ties" USING btree ("slice_id");--> statement-breakpoint
CREATE INDEX "slices_tenant_idx" ON "slices" USING btree ("tenant_id");--> statement-breakpoint
CREATE INDEX "spans_site_a_idx" ON "spans" USING btree ("site_a");--> statement-breakpoint
CREATE INDEX "spans_site_b_idx" ON "spans" USING btree ("site_b");--> statement-breakpoint
CREATE INDEX "audit_log_entity_idx" ON "audit_log" USING btree ("entity","entity_id");--> statement-breakpoint
CREATE INDEX "window_elements_window_idx" ON "window_elements" USING btree ("window_id");--> statement-breakpoint
CREATE INDEX "window_elements_element_idx" ON "window_elements" USING btree ("element_id");--> statement-breakpoint
CREATE INDEX "windows_time_idx" ON "windows" USING btree ("starts_at","ends_at");