CREATE TABLE "air_pump" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"name" text NOT NULL,
	"points" jsonb NOT NULL,
	"input_watts" double precision,
	"wire_to_air_percent" double precision DEFAULT 25 NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "scenario" ADD COLUMN "air_design" jsonb;--> statement-breakpoint
ALTER TABLE "site" ADD COLUMN "water" jsonb DEFAULT '{"altitudeM":0,"tanks":[]}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "air_pump" ADD CONSTRAINT "air_pump_workspace_id_workspace_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspace"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "air_pump_workspace_idx" ON "air_pump" USING btree ("workspace_id");