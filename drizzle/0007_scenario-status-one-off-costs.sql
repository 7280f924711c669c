ALTER TABLE "scenario" ADD COLUMN "status" text DEFAULT 'proposed' NOT NULL;--> statement-breakpoint
ALTER TABLE "scenario" ADD COLUMN "one_off_costs" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
-- What a site has now is what is installed: its baseline scenarios are already paid for.
UPDATE "scenario" SET "status" = 'installed' WHERE "is_baseline" = true;
