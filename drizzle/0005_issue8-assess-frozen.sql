-- A frozen assessment never changes: only its mitigation plan (and that plan's version and the
-- update time) may be updated, and the author link may be cleared when the user is deleted.
CREATE OR REPLACE FUNCTION assessment_refuse_frozen_update() RETURNS trigger AS $$
BEGIN
  IF NEW.id IS DISTINCT FROM OLD.id
    OR NEW.organization_id IS DISTINCT FROM OLD.organization_id
    OR NEW.site_id IS DISTINCT FROM OLD.site_id
    OR NEW.name IS DISTINCT FROM OLD.name
    OR NEW.author_name IS DISTINCT FROM OLD.author_name
    OR (NEW.author_user_id IS DISTINCT FROM OLD.author_user_id AND NEW.author_user_id IS NOT NULL)
    OR NEW.standard IS DISTINCT FROM OLD.standard
    OR NEW.tier IS DISTINCT FROM OLD.tier
    OR NEW.options IS DISTINCT FROM OLD.options
    OR NEW.site IS DISTINCT FROM OLD.site
    OR NEW.inventory IS DISTINCT FROM OLD.inventory
    OR NEW.runs::text IS DISTINCT FROM OLD.runs::text
    OR NEW.summary IS DISTINCT FROM OLD.summary
    OR NEW.results IS DISTINCT FROM OLD.results
    OR NEW.engine IS DISTINCT FROM OLD.engine
    OR NEW.created_at IS DISTINCT FROM OLD.created_at
  THEN
    RAISE EXCEPTION 'assessment % is frozen: only its mitigation plan may change', OLD.id USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER assessment_frozen BEFORE UPDATE ON "assessment" FOR EACH ROW EXECUTE FUNCTION assessment_refuse_frozen_update();
