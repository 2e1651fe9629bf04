CREATE TABLE "ramp_versions" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "ramp_versions_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"program_id" integer NOT NULL,
	"number" integer NOT NULL,
	"limits" jsonb NOT NULL,
	"reason" text NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "map_sets" ADD COLUMN "ramp_version_id" integer;--> statement-breakpoint
ALTER TABLE "ramp_versions" ADD CONSTRAINT "ramp_versions_program_id_vehicle_programs_id_fk" FOREIGN KEY ("program_id") REFERENCES "public"."vehicle_programs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ramp_versions" ADD CONSTRAINT "ramp_versions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "ramp_versions_program_number_idx" ON "ramp_versions" USING btree ("program_id","number");--> statement-breakpoint
ALTER TABLE "map_sets" ADD CONSTRAINT "map_sets_ramp_version_id_ramp_versions_id_fk" FOREIGN KEY ("ramp_version_id") REFERENCES "public"."ramp_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
-- A ramp version, like a parameter version, is what a set was judged and released with: frozen.
CREATE TRIGGER "ramp_versions_immutable" BEFORE UPDATE OR DELETE ON "ramp_versions"
  FOR EACH ROW EXECUTE FUNCTION mapwright_frozen_guard();
