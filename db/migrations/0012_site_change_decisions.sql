ALTER TABLE "site_change_notes" ADD COLUMN "decision" text;--> statement-breakpoint
ALTER TABLE "site_change_notes" ADD COLUMN "decision_note" text;--> statement-breakpoint
ALTER TABLE "site_change_notes" ADD COLUMN "decided_by" uuid;--> statement-breakpoint
ALTER TABLE "site_change_notes" ADD COLUMN "decided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "site_change_notes" ADD CONSTRAINT "site_change_notes_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;