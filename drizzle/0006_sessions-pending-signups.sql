CREATE TABLE "user_session" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"expires_at" timestamp NOT NULL,
	"revoked_at" timestamp
);
--> statement-breakpoint
ALTER TABLE "user_token" ADD COLUMN "name" text;--> statement-breakpoint
ALTER TABLE "user_token" ADD COLUMN "password_hash" text;--> statement-breakpoint
ALTER TABLE "user_session" ADD CONSTRAINT "user_session_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "user_session_user_idx" ON "user_session" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "user_session_expires_idx" ON "user_session" USING btree ("expires_at");--> statement-breakpoint
-- Pending sign-ups: a password chosen at sign-up waits on its confirmation link, never on an unconfirmed user.
UPDATE "user_token" SET "password_hash" = u."password_hash", "name" = u."name" FROM "user" u WHERE "user_token"."user_id" = u."id" AND u."emailVerified" IS NULL AND "user_token"."purpose" = 'verify-email' AND "user_token"."used_at" IS NULL;--> statement-breakpoint
UPDATE "user" SET "password_hash" = NULL, "name" = NULL WHERE "emailVerified" IS NULL;
