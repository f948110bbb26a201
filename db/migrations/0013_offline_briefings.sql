ALTER TABLE "briefings" ADD COLUMN "device_key" text;--> statement-breakpoint
ALTER TABLE "briefings" ADD COLUMN "completion_key" text;--> statement-breakpoint
ALTER TABLE "briefings" ADD COLUMN "created_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
UPDATE "briefings" SET "created_at" = "started_at";--> statement-breakpoint
ALTER TABLE "briefings" ADD COLUMN "against_superseded" boolean DEFAULT false NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "briefings_device_key_unique" ON "briefings" USING btree ("device_key");