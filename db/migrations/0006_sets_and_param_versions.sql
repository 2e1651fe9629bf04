CREATE TABLE "map_sets" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "map_sets_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"program_id" integer NOT NULL,
	"number" integer NOT NULL,
	"drive_revision_id" integer,
	"regen_revision_id" integer,
	"param_version_id" integer NOT NULL,
	"parts_key" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "map_sets_has_a_map" CHECK ("map_sets"."drive_revision_id" is not null or "map_sets"."regen_revision_id" is not null)
);
--> statement-breakpoint
CREATE TABLE "param_versions" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "param_versions_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"program_id" integer NOT NULL,
	"number" integer NOT NULL,
	"params" jsonb NOT NULL,
	"release_conditions" jsonb NOT NULL,
	"reason" text NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "set_releases" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "set_releases_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"set_id" integer NOT NULL,
	"program_id" integer NOT NULL,
	"released_by" integer NOT NULL,
	"released_at" timestamp with time zone DEFAULT now() NOT NULL,
	"acknowledgements" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"package_key" text,
	"package_name" text,
	"package_bytes" integer,
	"package_sha256" text,
	"manifest" jsonb,
	"retired_at" timestamp with time zone,
	"withdrawn_at" timestamp with time zone,
	"withdrawn_by" integer,
	"withdraw_reason" text
);
--> statement-breakpoint
ALTER TABLE "drive_reports" ADD COLUMN "set_id" integer;--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_program_id_vehicle_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."vehicle_programs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_drive_revision_id_map_revisions_id_fk" FOREIGN KEY ("drive_revision_id") REFERENCES "public"."map_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_regen_revision_id_map_revisions_id_fk" FOREIGN KEY ("regen_revision_id") REFERENCES "public"."map_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_param_version_id_param_versions_id_fk" FOREIGN KEY ("param_version_id") REFERENCES "public"."param_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "param_versions" ADD CONSTRAINT "param_versions_program_id_vehicle_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."vehicle_programs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "param_versions" ADD CONSTRAINT "param_versions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "set_releases" ADD CONSTRAINT "set_releases_set_id_map_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."map_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "set_releases" ADD CONSTRAINT "set_releases_program_id_vehicle_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."vehicle_programs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "set_releases" ADD CONSTRAINT "set_releases_released_by_users_id_fk" FOREIGN KEY ("released_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "set_releases" ADD CONSTRAINT "set_releases_withdrawn_by_users_id_fk" FOREIGN KEY ("withdrawn_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "map_sets_program_number_idx" ON "map_sets" USING btree ("program_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "map_sets_parts_idx" ON "map_sets" USING btree ("program_id","parts_key");--> statement-breakpoint
CREATE UNIQUE INDEX "param_versions_program_number_idx" ON "param_versions" USING btree ("program_id","number");--> statement-breakpoint
CREATE INDEX "set_releases_set_idx" ON "set_releases" USING btree ("set_id");--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_set_id_map_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."map_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "drive_reports_set_idx" ON "drive_reports" USING btree ("set_id");--> statement-breakpoint
-- Data older than sets (what was chosen is described in docs/architecture.md, "Migration 0006"):
-- 1. each program's parameters and release conditions become its parameter version 1;
-- 2. each per-map release becomes a release of a set that pairs the released revision with the
--    program's release of the other kind that was current at that moment (else the other kind's
--    first release after it, else that map's latest revision; none when the program has no map
--    of the other kind) and parameter version 1; a combination met twice is one set;
-- 3. each drive report moves to the first set holding its revision (a set is made the same way
--    when none does, pairing at the report's filing time); each flag names its report's map kind.
CREATE FUNCTION mapwright_0006_other(p_program integer, p_kind text, p_at timestamptz) RETURNS integer AS $$
DECLARE found integer;
BEGIN
  SELECT r.revision_id INTO found FROM releases r JOIN maps m ON m.id = r.map_id
    WHERE m.program_id = p_program AND m.kind = p_kind AND r.released_at <= p_at
      AND (r.retired_at IS NULL OR r.retired_at > p_at) AND (r.withdrawn_at IS NULL OR r.withdrawn_at > p_at)
    ORDER BY r.released_at DESC, r.id DESC LIMIT 1;
  IF found IS NULL THEN
    SELECT r.revision_id INTO found FROM releases r JOIN maps m ON m.id = r.map_id
      WHERE m.program_id = p_program AND m.kind = p_kind AND r.released_at > p_at
      ORDER BY r.released_at, r.id LIMIT 1;
  END IF;
  IF found IS NULL THEN
    SELECT mr.id INTO found FROM map_revisions mr JOIN maps m ON m.id = mr.map_id
      WHERE m.program_id = p_program AND m.kind = p_kind
      ORDER BY (mr.created_at <= p_at) DESC, mr.created_at DESC, mr.id DESC LIMIT 1;
  END IF;
  RETURN found;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE FUNCTION mapwright_0006_set(p_program integer, p_revision integer, p_kind text, p_at timestamptz, p_by integer) RETURNS integer AS $$
DECLARE other integer; drv integer; rgn integer; pv integer; k text; sid integer;
BEGIN
  other := mapwright_0006_other(p_program, CASE WHEN p_kind = 'drive' THEN 'regen' ELSE 'drive' END, p_at);
  IF p_kind = 'drive' THEN drv := p_revision; rgn := other; ELSE drv := other; rgn := p_revision; END IF;
  SELECT id INTO pv FROM param_versions WHERE program_id = p_program AND number = 1;
  k := 'd' || coalesce(drv::text, '-') || ':r' || coalesce(rgn::text, '-') || ':p' || pv;
  SELECT id INTO sid FROM map_sets WHERE program_id = p_program AND parts_key = k;
  IF sid IS NULL THEN
    INSERT INTO map_sets (program_id, number, drive_revision_id, regen_revision_id, param_version_id, parts_key, note, created_by, created_at)
      VALUES (p_program, (SELECT coalesce(max(number), 0) + 1 FROM map_sets WHERE program_id = p_program), drv, rgn, pv, k,
              'Made by migration 0006 from data older than sets.', p_by, p_at)
      RETURNING id INTO sid;
  END IF;
  RETURN sid;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
INSERT INTO param_versions (program_id, number, params, release_conditions, reason, created_by, created_at)
  SELECT id, 1, params, release_conditions, 'The parameters as they stood when parameter versions were introduced', created_by, updated_at FROM vehicle_programs;
--> statement-breakpoint
DO $$
DECLARE rel record; rep record; sid integer;
BEGIN
  FOR rel IN SELECT r.*, m.program_id, m.kind, u.name AS releaser FROM releases r JOIN maps m ON m.id = r.map_id JOIN users u ON u.id = r.released_by ORDER BY r.released_at, r.id LOOP
    sid := mapwright_0006_set(rel.program_id, rel.revision_id, rel.kind, rel.released_at, rel.released_by);
    INSERT INTO set_releases (set_id, program_id, released_by, released_at, acknowledgements, retired_at, withdrawn_at, withdrawn_by, withdraw_reason)
      VALUES (sid, rel.program_id, rel.released_by, rel.released_at,
        (SELECT coalesce(jsonb_agg(jsonb_build_object(
            'key', 'traction:' || rel.kind || ':' || split_part(a->>'key', ':', 2) || ':' || split_part(a->>'key', ':', 3),
            'reason', a->>'reason', 'mapKind', rel.kind, 'revisionId', rel.revision_id,
            'surface', split_part(a->>'key', ':', 2), 'loadCase', split_part(a->>'key', ':', 3),
            'byId', rel.released_by, 'byName', rel.releaser, 'at', to_jsonb(rel.released_at))), '[]'::jsonb)
          FROM jsonb_array_elements(rel.acknowledgements) a),
        rel.retired_at, rel.withdrawn_at, rel.withdrawn_by, rel.withdraw_reason);
  END LOOP;
  -- Two maps each had a current release; a program has one current set: the latest stays current.
  UPDATE set_releases s SET retired_at = latest.released_at
    FROM (SELECT DISTINCT ON (program_id) id, program_id, released_at FROM set_releases
          WHERE retired_at IS NULL AND withdrawn_at IS NULL ORDER BY program_id, released_at DESC, id DESC) latest
    WHERE s.program_id = latest.program_id AND s.id <> latest.id AND s.retired_at IS NULL AND s.withdrawn_at IS NULL;
  FOR rep IN SELECT d.id, d.revision_id, d.driver_id, d.created_at, m.program_id, m.kind FROM drive_reports d
      JOIN map_revisions mr ON mr.id = d.revision_id JOIN maps m ON m.id = mr.map_id ORDER BY d.id LOOP
    SELECT id INTO sid FROM map_sets WHERE drive_revision_id = rep.revision_id OR regen_revision_id = rep.revision_id ORDER BY number LIMIT 1;
    IF sid IS NULL THEN
      sid := mapwright_0006_set(rep.program_id, rep.revision_id, rep.kind, rep.created_at, rep.driver_id);
    END IF;
    UPDATE drive_reports SET set_id = sid,
      flags = (SELECT coalesce(jsonb_agg(f || jsonb_build_object('map', rep.kind)), '[]'::jsonb) FROM jsonb_array_elements(flags) f)
      WHERE id = rep.id;
  END LOOP;
END;
$$;
--> statement-breakpoint
DROP FUNCTION mapwright_0006_set(integer, integer, text, timestamptz, integer);
--> statement-breakpoint
DROP FUNCTION mapwright_0006_other(integer, text, timestamptz);
--> statement-breakpoint
CREATE UNIQUE INDEX "set_releases_one_current_per_program_idx" ON "set_releases" USING btree ("program_id") WHERE "set_releases"."retired_at" is null and "set_releases"."withdrawn_at" is null;
