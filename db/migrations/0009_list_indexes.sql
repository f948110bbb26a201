-- Trigram search for titles and component names (ILIKE '%…%'); a trusted extension on PostgreSQL 13+, bundled with PGlite.
CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
DROP INDEX "audit_events_entity_idx";--> statement-breakpoint
DROP INDEX "audit_events_organisation_idx";--> statement-breakpoint
ALTER TABLE "revisions" ADD COLUMN "is_latest" boolean DEFAULT false NOT NULL;--> statement-breakpoint
UPDATE "revisions" AS r SET "is_latest" = true WHERE r."number" = (SELECT max(o."number") FROM "revisions" AS o WHERE o."assessment_id" = r."assessment_id");--> statement-breakpoint
CREATE INDEX "assessments_organisation_title_idx" ON "assessments" USING btree ("organisation_id","title","id");--> statement-breakpoint
CREATE INDEX "assessments_job_idx" ON "assessments" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "assessments_title_trgm_idx" ON "assessments" USING gin ("title" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "components_organisation_sort_name_idx" ON "components" USING btree ("organisation_id","name","id");--> statement-breakpoint
CREATE INDEX "components_organisation_mass_idx" ON "components" USING btree ("organisation_id","mass_kg","id");--> statement-breakpoint
CREATE INDEX "components_name_trgm_idx" ON "components" USING gin ("name" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "jobs_organisation_name_idx" ON "jobs" USING btree ("organisation_id","name","id");--> statement-breakpoint
CREATE UNIQUE INDEX "revisions_latest_unique" ON "revisions" USING btree ("assessment_id") WHERE "revisions"."is_latest";--> statement-breakpoint
CREATE INDEX "revisions_latest_updated_idx" ON "revisions" USING btree ("organisation_id","updated_at","id") WHERE "revisions"."is_latest";--> statement-breakpoint
CREATE INDEX "revisions_organisation_status_idx" ON "revisions" USING btree ("organisation_id","status");--> statement-breakpoint
CREATE INDEX "revisions_approver_status_idx" ON "revisions" USING btree ("approver_id","status");--> statement-breakpoint
CREATE INDEX "audit_events_entity_idx" ON "audit_events" USING btree ("entity_type","entity_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_organisation_idx" ON "audit_events" USING btree ("organisation_id","created_at");