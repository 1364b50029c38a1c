-- An issued document's PDF never changes: once a document is issued and its bytes are stored, any
-- update of the bytes, their SHA-256 or size, the kind, version, code, assessment or issue date is
-- refused, whatever the state moves to (superseded and withdrawn keep the same bytes), and an
-- issued document never goes back to draft or review.
CREATE OR REPLACE FUNCTION document_refuse_issued_change() RETURNS trigger AS $$
BEGIN
  IF OLD.state IN ('issued', 'superseded', 'withdrawn') AND OLD.pdf IS NOT NULL AND (
    NEW.pdf IS DISTINCT FROM OLD.pdf
    OR NEW.sha256 IS DISTINCT FROM OLD.sha256
    OR NEW.byte_size IS DISTINCT FROM OLD.byte_size
    OR NEW.kind IS DISTINCT FROM OLD.kind
    OR NEW.version IS DISTINCT FROM OLD.version
    OR NEW.code IS DISTINCT FROM OLD.code
    OR NEW.assessment_id IS DISTINCT FROM OLD.assessment_id
    OR NEW.issued_at IS DISTINCT FROM OLD.issued_at
  ) THEN
    RAISE EXCEPTION 'document % is issued: its PDF cannot change', OLD.id USING ERRCODE = 'check_violation';
  END IF;
  IF OLD.state IN ('issued', 'superseded', 'withdrawn') AND NEW.state IN ('draft', 'in_review') THEN
    RAISE EXCEPTION 'document % is issued: it cannot go back to %', OLD.id, NEW.state USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER document_frozen BEFORE UPDATE ON "document" FOR EACH ROW EXECUTE FUNCTION document_refuse_issued_change();
