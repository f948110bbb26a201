ALTER TABLE "revisions" ADD COLUMN "results" jsonb;--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "worst_band" text;