-- site.emitter_count follows the emitter table: one statement-level trigger per kind of change,
-- reading the statement's transition tables, so a 5 000-row import updates its site once.
UPDATE "site" SET "emitter_count" = (SELECT count(*) FROM "emitter" WHERE "emitter"."site_id" = "site"."id");
--> statement-breakpoint
CREATE FUNCTION "site_emitter_count_added"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE "site" SET "emitter_count" = "site"."emitter_count" + n.c
  FROM (SELECT "site_id", count(*) AS c FROM added GROUP BY "site_id") n WHERE "site"."id" = n."site_id";
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION "site_emitter_count_removed"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE "site" SET "emitter_count" = greatest(0, "site"."emitter_count" - n.c)
  FROM (SELECT "site_id", count(*) AS c FROM removed GROUP BY "site_id") n WHERE "site"."id" = n."site_id";
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE FUNCTION "site_emitter_count_moved"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE "site" SET "emitter_count" = greatest(0, "site"."emitter_count" + n.c)
  FROM (
    SELECT "site_id", sum(d) AS c FROM (
      SELECT "site_id", 1 AS d FROM added UNION ALL SELECT "site_id", -1 AS d FROM removed
    ) moves GROUP BY "site_id" HAVING sum(d) <> 0
  ) n WHERE "site"."id" = n."site_id";
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER "emitter_count_insert" AFTER INSERT ON "emitter" REFERENCING NEW TABLE AS added FOR EACH STATEMENT EXECUTE FUNCTION "site_emitter_count_added"();
--> statement-breakpoint
CREATE TRIGGER "emitter_count_delete" AFTER DELETE ON "emitter" REFERENCING OLD TABLE AS removed FOR EACH STATEMENT EXECUTE FUNCTION "site_emitter_count_removed"();
--> statement-breakpoint
CREATE TRIGGER "emitter_count_update" AFTER UPDATE ON "emitter" REFERENCING OLD TABLE AS removed NEW TABLE AS added FOR EACH STATEMENT EXECUTE FUNCTION "site_emitter_count_moved"();
