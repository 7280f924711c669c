CREATE TABLE "priced_result" (
	"scenario_id" uuid NOT NULL,
	"slot" text NOT NULL,
	"input_key" text NOT NULL,
	"rules_version" integer NOT NULL,
	"depends_on" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"summary" jsonb NOT NULL,
	"computed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "priced_result_scenario_id_slot_pk" PRIMARY KEY("scenario_id","slot")
);
--> statement-breakpoint
CREATE TABLE "rate_limit_hit" (
	"key" text PRIMARY KEY NOT NULL,
	"hits" integer NOT NULL,
	"expires_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_lock" (
	"key" text PRIMARY KEY NOT NULL,
	"locked_until" timestamp with time zone NOT NULL
);
--> statement-breakpoint
ALTER TABLE "priced_result" ADD CONSTRAINT "priced_result_scenario_id_scenario_id_fk" FOREIGN KEY ("scenario_id") REFERENCES "public"."scenario"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rate_limit_hit_expires_idx" ON "rate_limit_hit" USING btree ("expires_at");--> statement-breakpoint
CREATE INDEX "sign_in_lock_until_idx" ON "sign_in_lock" USING btree ("locked_until");