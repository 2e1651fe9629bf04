ALTER TABLE "users" ADD COLUMN "invited_at" timestamp with time zone;--> statement-breakpoint
-- Accounts invited before this column existed, whose password was never set since: still invited.
UPDATE "users" u SET "invited_at" = u."created_at"
WHERE EXISTS (SELECT 1 FROM "audit_log" a WHERE a."entity_type" = 'user' AND a."entity_id" = u."id" AND a."action" = 'user.invite')
  AND NOT EXISTS (
    SELECT 1 FROM "audit_log" a WHERE a."entity_type" = 'user' AND a."entity_id" = u."id"
      AND (a."action" IN ('auth.invite-used', 'auth.reset-used') OR (a."action" = 'user.update' AND a."details"->>'passwordChanged' = 'true'))
  );
