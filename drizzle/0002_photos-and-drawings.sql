CREATE TYPE "public"."upload_status" AS ENUM('awaiting_upload', 'ready');--> statement-breakpoint
ALTER TABLE "drawings" ADD COLUMN "status" "upload_status" DEFAULT 'awaiting_upload' NOT NULL;--> statement-breakpoint
ALTER TABLE "drawings" ADD COLUMN "upload_expires_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "drawings" ADD COLUMN "file_label" text;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "status_message" text;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "upload_expires_at" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "drawings_upload_expiry_idx" ON "drawings" USING btree ("upload_expires_at") WHERE status = 'awaiting_upload';--> statement-breakpoint
CREATE INDEX "photos_upload_expiry_idx" ON "photos" USING btree ("upload_expires_at") WHERE status = 'awaiting_upload';