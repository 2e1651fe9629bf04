CREATE TABLE "drive_logs" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "drive_logs_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"report_id" integer NOT NULL,
	"object_key" text NOT NULL,
	"file_name" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"status" text DEFAULT 'uploaded' NOT NULL,
	"progress_bytes" bigint DEFAULT 0 NOT NULL,
	"error_message" text,
	"mapping" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"analysis" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"analysed_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "drive_reports" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "drive_reports_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"revision_id" integer NOT NULL,
	"driver_id" integer NOT NULL,
	"driven_on" date NOT NULL,
	"vehicle_unit" text NOT NULL,
	"route" text NOT NULL,
	"surface" text NOT NULL,
	"weather" text NOT NULL,
	"ambient_c" real NOT NULL,
	"load_case" text NOT NULL,
	"payload_kg" real NOT NULL,
	"trailer" boolean NOT NULL,
	"ratings" jsonb NOT NULL,
	"comments" text DEFAULT '' NOT NULL,
	"flags" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"safety" text DEFAULT 'none' NOT NULL,
	"safety_resolved_by" integer,
	"safety_resolved_at" timestamp with time zone,
	"safety_resolution" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "drive_reports_safety_check" CHECK ("drive_reports"."safety" in ('none', 'open', 'resolved'))
);
--> statement-breakpoint
ALTER TABLE "drive_logs" ADD CONSTRAINT "drive_logs_report_id_drive_reports_id_fk" FOREIGN KEY ("report_id") REFERENCES "public"."drive_reports"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_revision_id_map_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."map_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_driver_id_users_id_fk" FOREIGN KEY ("driver_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_safety_resolved_by_users_id_fk" FOREIGN KEY ("safety_resolved_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "drive_logs_object_key_idx" ON "drive_logs" USING btree ("object_key");--> statement-breakpoint
CREATE INDEX "drive_logs_report_idx" ON "drive_logs" USING btree ("report_id");--> statement-breakpoint
CREATE INDEX "drive_reports_revision_idx" ON "drive_reports" USING btree ("revision_id");--> statement-breakpoint
CREATE INDEX "drive_reports_driver_idx" ON "drive_reports" USING btree ("driver_id");