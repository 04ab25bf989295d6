ALTER TABLE "docking_items" ADD COLUMN "unit_rate" numeric(14, 4);--> statement-breakpoint
ALTER TABLE "docking_items" ADD COLUMN "added_reason" text;--> statement-breakpoint
ALTER TABLE "docking_items" ADD COLUMN "added_by" uuid;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_added_by_users_id_fk" FOREIGN KEY ("added_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_own_rate_only_other" CHECK (("docking_items"."kind" = 'other') = ("docking_items"."unit_rate" is not null));--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_other_has_reason" CHECK ("docking_items"."kind" <> 'other' or "docking_items"."added_reason" is not null);