ALTER TABLE "releases" DISABLE ROW LEVEL SECURITY;--> statement-breakpoint
DROP TABLE "releases" CASCADE;--> statement-breakpoint
ALTER TABLE "drive_reports" DROP CONSTRAINT "drive_reports_revision_id_map_revisions_id_fk";
--> statement-breakpoint
DROP INDEX "drive_reports_revision_idx";--> statement-breakpoint
ALTER TABLE "drive_reports" ALTER COLUMN "set_id" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "drive_reports" DROP COLUMN "revision_id";--> statement-breakpoint
-- What was judged and released never changes: parameter versions and sets cannot be updated or
-- deleted; a set release can only be retired, brought back, or withdrawn once, never altered.
CREATE FUNCTION mapwright_frozen_guard() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION '% % is immutable and cannot be %', TG_TABLE_NAME, OLD."id", lower(TG_OP) || 'd'
    USING ERRCODE = 'integrity_constraint_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER "param_versions_immutable" BEFORE UPDATE OR DELETE ON "param_versions"
  FOR EACH ROW EXECUTE FUNCTION mapwright_frozen_guard();
--> statement-breakpoint
CREATE TRIGGER "map_sets_immutable" BEFORE UPDATE OR DELETE ON "map_sets"
  FOR EACH ROW EXECUTE FUNCTION mapwright_frozen_guard();
--> statement-breakpoint
CREATE FUNCTION mapwright_set_release_guard() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    RAISE EXCEPTION 'set release % cannot be deleted', OLD."id" USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  IF NEW."set_id" IS DISTINCT FROM OLD."set_id" OR NEW."program_id" IS DISTINCT FROM OLD."program_id"
     OR NEW."released_by" IS DISTINCT FROM OLD."released_by" OR NEW."released_at" IS DISTINCT FROM OLD."released_at"
     OR NEW."acknowledgements" IS DISTINCT FROM OLD."acknowledgements" OR NEW."manifest" IS DISTINCT FROM OLD."manifest"
     OR NEW."package_key" IS DISTINCT FROM OLD."package_key" OR NEW."package_name" IS DISTINCT FROM OLD."package_name"
     OR NEW."package_bytes" IS DISTINCT FROM OLD."package_bytes" OR NEW."package_sha256" IS DISTINCT FROM OLD."package_sha256"
     OR (OLD."withdrawn_at" IS NOT NULL AND (NEW."withdrawn_at" IS DISTINCT FROM OLD."withdrawn_at"
         OR NEW."withdrawn_by" IS DISTINCT FROM OLD."withdrawn_by" OR NEW."withdraw_reason" IS DISTINCT FROM OLD."withdraw_reason")) THEN
    RAISE EXCEPTION 'set release % is frozen: only retiring, bringing back or withdrawing it is recorded', OLD."id"
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER "set_releases_frozen" BEFORE UPDATE OR DELETE ON "set_releases"
  FOR EACH ROW EXECUTE FUNCTION mapwright_set_release_guard();
