-- CHECK constraints derived from the domain constants (domain/, physics/load-cases.ts, physics/surfaces.ts).
ALTER TABLE "auth_tokens" ADD CONSTRAINT "auth_tokens_kind_check" CHECK ("auth_tokens"."kind" in ('invite', 'reset'));--> statement-breakpoint
ALTER TABLE "drive_logs" ADD CONSTRAINT "drive_logs_status_check" CHECK ("drive_logs"."status" in ('uploaded', 'analysing', 'done', 'failed'));--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_surface_check" CHECK ("drive_reports"."surface" in ('dry-asphalt', 'wet-asphalt', 'gravel', 'packed-snow', 'ice'));--> statement-breakpoint
ALTER TABLE "drive_reports" ADD CONSTRAINT "drive_reports_load_case_check" CHECK ("drive_reports"."load_case" in ('empty', 'laden', 'trailer-empty', 'trailer-laden'));--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD CONSTRAINT "mail_outbox_status_check" CHECK ("mail_outbox"."status" in ('pending', 'sent', 'failed'));--> statement-breakpoint
-- 0003 added this check by hand (outside the snapshot); drop it so the schema-derived one takes its place.
ALTER TABLE "map_revisions" DROP CONSTRAINT IF EXISTS "map_revisions_state_check";--> statement-breakpoint
ALTER TABLE "map_revisions" ADD CONSTRAINT "map_revisions_state_check" CHECK ("map_revisions"."state" in ('draft', 'in_review', 'returned', 'approved', 'released', 'retired', 'withdrawn'));--> statement-breakpoint
ALTER TABLE "revision_events" ADD CONSTRAINT "revision_events_action_check" CHECK ("revision_events"."action" in ('submit', 'approve', 'send_back', 'release', 'withdraw'));--> statement-breakpoint
ALTER TABLE "revision_events" ADD CONSTRAINT "revision_events_from_state_check" CHECK ("revision_events"."from_state" in ('draft', 'in_review', 'returned', 'approved', 'released', 'retired', 'withdrawn'));--> statement-breakpoint
ALTER TABLE "revision_events" ADD CONSTRAINT "revision_events_to_state_check" CHECK ("revision_events"."to_state" in ('draft', 'in_review', 'returned', 'approved', 'released', 'retired', 'withdrawn'));