ALTER TABLE "tariff" ADD COLUMN "urdb_label" text;--> statement-breakpoint
CREATE INDEX "tariff_urdb_label_idx" ON "tariff" USING btree ("urdb_label");