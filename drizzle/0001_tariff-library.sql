CREATE TABLE "tariff_version" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"tariff_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"effective_from" date NOT NULL,
	"effective_to" date,
	"structure" jsonb NOT NULL,
	"source" text NOT NULL,
	"checked_on" date NOT NULL,
	"change_note" text DEFAULT '' NOT NULL,
	"published_by" text,
	"published_by_name" text,
	"published_at" timestamp DEFAULT now() NOT NULL,
	CONSTRAINT "tariff_version_number" UNIQUE("tariff_id","number")
);
--> statement-breakpoint
CREATE TABLE "tariff" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid,
	"utility" text NOT NULL,
	"name" text NOT NULL,
	"code" text,
	"country" text NOT NULL,
	"region" text,
	"area" text,
	"customer_class" text NOT NULL,
	"currency" text NOT NULL,
	"timezone" text NOT NULL,
	"holidays" jsonb,
	"description" text,
	"copied_from_id" uuid,
	"revision" integer DEFAULT 0 NOT NULL,
	"created_by" text,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "tariff_version" ADD CONSTRAINT "tariff_version_tariff_id_tariff_id_fk" FOREIGN KEY ("tariff_id") REFERENCES "public"."tariff"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tariff_version" ADD CONSTRAINT "tariff_version_published_by_user_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tariff" ADD CONSTRAINT "tariff_workspace_id_workspace_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspace"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tariff" ADD CONSTRAINT "tariff_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "tariff_version_tariff_idx" ON "tariff_version" USING btree ("tariff_id","effective_from");--> statement-breakpoint
CREATE INDEX "tariff_workspace_idx" ON "tariff" USING btree ("workspace_id");--> statement-breakpoint
CREATE INDEX "tariff_country_idx" ON "tariff" USING btree ("country","region");