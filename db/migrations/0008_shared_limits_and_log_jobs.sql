CREATE TABLE "rate_events" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "rate_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"key" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "drive_logs" ADD COLUMN "claimed_by" text;--> statement-breakpoint
ALTER TABLE "drive_logs" ADD COLUMN "lease_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "drive_logs" ADD COLUMN "attempts" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "rate_events_key_at_idx" ON "rate_events" USING btree ("key","at");--> statement-breakpoint
CREATE INDEX "rate_events_at_idx" ON "rate_events" USING btree ("at");--> statement-breakpoint
CREATE INDEX "drive_logs_jobs_idx" ON "drive_logs" USING btree ("status","lease_until");