DROP INDEX "audit_events_entity_idx";--> statement-breakpoint
DROP INDEX "audit_events_organisation_idx";--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "is_latest" boolean DEFAULT false NOT NULL;--> statement-breakpoint
UPDATE "revisions" AS r SET "is_latest" = true WHERE r."number" = (SELECT max(o."number") FROM "revisions" AS o WHERE o."assessment_id" = r."assessment_id");--> statement-breakpoint
CREATE INDEX "assessments_organisation_title_idx" ON "assessments" USING btree ("organisation_id","title","id");--> statement-breakpoint
CREATE INDEX "jobs_organisation_name_idx" ON "jobs" USING btree ("organisation_id","name","id");--> statement-breakpoint
CREATE UNIQUE INDEX "revisions_latest_unique" ON "revisions" USING btree ("assessment_id") WHERE "revisions"."is_latest";--> statement-breakpoint
CREATE INDEX "revisions_latest_updated_idx" ON "revisions" USING btree ("organisation_id","updated_at","id") WHERE "revisions"."is_latest";--> statement-breakpoint
CREATE INDEX "revisions_organisation_status_idx" ON "revisions" USING btree ("organisation_id","status");--> statement-breakpoint
CREATE INDEX "revisions_approver_status_idx" ON "revisions" USING btree ("approver_id","status");--> statement-breakpoint
CREATE INDEX "audit_events_entity_idx" ON "audit_events" USING btree ("entity_type","entity_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_organisation_idx" ON "audit_events" USING btree ("organisation_id","created_at");