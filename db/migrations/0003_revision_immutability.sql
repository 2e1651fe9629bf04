-- A revision's content never changes after it is saved, and once it has left the draft state it
-- cannot be deleted: enforced in the database so no code path or hand-written SQL can bypass it.
ALTER TABLE "map_revisions" ADD CONSTRAINT "map_revisions_state_check"
  CHECK ("state" IN ('draft', 'in_review', 'returned', 'approved', 'released', 'retired', 'withdrawn'));
--> statement-breakpoint
CREATE OR REPLACE FUNCTION mapwright_revision_guard() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF OLD."state" <> 'draft' THEN
      RAISE EXCEPTION 'revision % of map % is % and cannot be deleted', OLD."number", OLD."map_id", OLD."state"
        USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN OLD;
  END IF;
  IF NEW."table" IS DISTINCT FROM OLD."table"
     OR NEW."checksum" IS DISTINCT FROM OLD."checksum"
     OR NEW."number" IS DISTINCT FROM OLD."number"
     OR NEW."map_id" IS DISTINCT FROM OLD."map_id"
     OR NEW."author_id" IS DISTINCT FROM OLD."author_id"
     OR NEW."parent_id" IS DISTINCT FROM OLD."parent_id"
     OR NEW."message" IS DISTINCT FROM OLD."message"
     OR NEW."notes" IS DISTINCT FROM OLD."notes"
     OR NEW."created_at" IS DISTINCT FROM OLD."created_at" THEN
    RAISE EXCEPTION 'revision % of map % is immutable: its axes, values and checksum cannot change', OLD."number", OLD."map_id"
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER "map_revisions_immutable"
  BEFORE UPDATE OR DELETE ON "map_revisions"
  FOR EACH ROW EXECUTE FUNCTION mapwright_revision_guard();
