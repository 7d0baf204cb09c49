CREATE TABLE "window_idempotency_keys" (
	"user_id" text NOT NULL,
	"key" text NOT NULL,
	"request_hash" text NOT NULL,
	"window_id" text,
	"created_at" timestamp with time zone NOT NULL,
	CONSTRAINT "window_idempotency_keys_user_id_key_pk" PRIMARY KEY("user_id","key")
);
--> statement-breakpoint
ALTER TABLE "window_idempotency_keys" ADD CONSTRAINT "window_idempotency_keys_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "window_idempotency_keys" ADD CONSTRAINT "window_idempotency_keys_window_id_windows_id_fk" FOREIGN KEY ("window_id") REFERENCES "public"."windows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "window_idempotency_keys_created_idx" ON "window_idempotency_keys" USING btree ("created_at");