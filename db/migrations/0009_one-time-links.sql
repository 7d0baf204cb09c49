CREATE TABLE "one_time_links" (
	"id" text PRIMARY KEY NOT NULL,
	"kind" text NOT NULL,
	"token_hash" text NOT NULL,
	"user_id" text,
	"email" text,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "one_time_links" ADD CONSTRAINT "one_time_links_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "one_time_links_token_hash_key" ON "one_time_links" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "one_time_links_kind_idx" ON "one_time_links" USING btree ("kind");