ALTER TABLE "email_deliveries" ADD COLUMN "method" text;--> statement-breakpoint
ALTER TABLE "email_deliveries" ADD COLUMN "link_expires_at" timestamp with time zone;