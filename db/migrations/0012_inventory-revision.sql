-- Inventory revision: one number every write to the tables the compiled inventory reads bumps, in the writing
-- transaction (so readers see the new number exactly when they can see the new rows), announced on the
-- slackwater_inventory channel at commit. Statement-level triggers cover every writer: imports, plan apply,
-- demo removal, seeds, tests.
CREATE TABLE "inventory_state" (
	"id" text PRIMARY KEY NOT NULL,
	"revision" bigint NOT NULL
);
--> statement-breakpoint
INSERT INTO "inventory_state" ("id", "revision") VALUES ('inventory', 1);
--> statement-breakpoint
CREATE FUNCTION "bump_inventory_revision"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
	next_revision bigint;
BEGIN
	UPDATE "inventory_state" SET "revision" = "revision" + 1 WHERE "id" = 'inventory' RETURNING "revision" INTO next_revision;
	PERFORM pg_notify('slackwater_inventory', next_revision::text);
	RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER "sites_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "sites"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "spans_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "spans"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "tenants_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "tenants"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "slices_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "slices"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "slice_functions_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "slice_functions"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "slice_ties_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "slice_ties"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "placements_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "placements"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
--> statement-breakpoint
CREATE TRIGGER "network_meta_bump_inventory_revision" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "network_meta"
	FOR EACH STATEMENT EXECUTE FUNCTION "bump_inventory_revision"();
