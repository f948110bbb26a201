CREATE TABLE "hazard_library" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"hazard" text NOT NULL,
	"who_is_at_risk" text NOT NULL,
	"likelihood_before" integer NOT NULL,
	"severity_before" integer NOT NULL,
	"controls" jsonb NOT NULL,
	"likelihood_after" integer NOT NULL,
	"severity_after" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "hazard_library" ADD CONSTRAINT "hazard_library_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "hazard_library_organisation_hazard_idx" ON "hazard_library" USING btree ("organisation_id","hazard");