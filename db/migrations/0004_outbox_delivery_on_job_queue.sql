DROP INDEX "outbox_due_idx";--> statement-breakpoint
ALTER TABLE "outbox" DROP COLUMN "next_attempt_at";--> statement-breakpoint
ALTER TABLE "outbox" DROP COLUMN "locked_until";