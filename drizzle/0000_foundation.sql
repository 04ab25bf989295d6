CREATE TYPE "public"."anode_kind" AS ENUM('aluminium', 'zinc', 'other');--> statement-breakpoint
CREATE TYPE "public"."atmosphere_rule_set" AS ENUM('msc581', 'a1050');--> statement-breakpoint
CREATE TYPE "public"."coating_area" AS ENUM('shell_plating', 'bulkhead_plating', 'inner_bottom_deck_plating', 'stringers', 'girders_web_frames', 'longitudinals_brackets', 'edges_welds', 'piping_fittings');--> statement-breakpoint
CREATE TYPE "public"."coating_system" AS ENUM('hard', 'semi_hard', 'soft', 'none');--> statement-breakpoint
CREATE TYPE "public"."cost_rate_kind" AS ENUM('steel_per_kg', 'coating_per_m2', 'anode_per_piece', 'sediment_per_m3');--> statement-breakpoint
CREATE TYPE "public"."delivery_status" AS ENUM('queued', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."docking_item_kind" AS ENUM('steel', 'coating', 'anodes', 'sediment', 'other');--> statement-breakpoint
CREATE TYPE "public"."docking_status" AS ENUM('planned', 'in_progress', 'completed', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."drawing_kind" AS ENUM('general_arrangement', 'midship_section', 'shell_expansion', 'other');--> statement-breakpoint
CREATE TYPE "public"."finding_status" AS ENUM('open', 'monitoring', 'closed');--> statement-breakpoint
CREATE TYPE "public"."finding_type" AS ENUM('crack', 'dent', 'buckling', 'general_corrosion', 'pitting', 'grooving', 'thickness_diminution', 'coating_breakdown', 'erosion', 'contact_damage', 'loose_fitting', 'other');--> statement-breakpoint
CREATE TYPE "public"."inspection_status" AS ENUM('draft', 'submitted', 'returned', 'countersigned', 'superseded');--> statement-breakpoint
CREATE TYPE "public"."member_kind" AS ENUM('plating', 'longitudinal', 'stringer_deck', 'bottom_girder', 'web_frame', 'transverse_frame', 'bracket', 'bulkhead', 'manhole', 'bell_mouth', 'piping', 'other');--> statement-breakpoint
CREATE TYPE "public"."not_inspected_reason" AS ENUM('no_staging', 'water', 'sediment', 'blocked_or_closed', 'time', 'safety', 'other');--> statement-breakpoint
CREATE TYPE "public"."photo_kind" AS ENUM('overview', 'close_up');--> statement-breakpoint
CREATE TYPE "public"."photo_status" AS ENUM('awaiting_upload', 'processing', 'ready', 'rejected');--> statement-breakpoint
CREATE TYPE "public"."place_kind" AS ENUM('port', 'at_sea', 'dry_dock', 'anchorage');--> statement-breakpoint
CREATE TYPE "public"."plating_region" AS ENUM('inner_bottom', 'bottom_shell', 'lower_hopper', 'side_shell', 'longitudinal_bulkhead', 'upper_hopper', 'main_deck', 'transverse_bulkhead');--> statement-breakpoint
CREATE TYPE "public"."recipient_kind" AS ENUM('office', 'class');--> statement-breakpoint
CREATE TYPE "public"."repair_kind" AS ENUM('insert_plate', 'bracket_renewal', 'profile_renewal', 'fairing', 'coating_touch_up', 'monitor_only');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('officer', 'master', 'superintendent', 'admin', 'surveyor');--> statement-breakpoint
CREATE TYPE "public"."signature_kind" AS ENUM('officer', 'master');--> statement-breakpoint
CREATE TYPE "public"."stringer_numbering" AS ENUM('from_top', 'from_bottom');--> statement-breakpoint
CREATE TYPE "public"."tank_kind" AS ENUM('double_bottom', 'hopper', 'side', 'top_side', 'fore_peak', 'aft_peak', 'double_bottom_hopper', 'double_bottom_side', 'hopper_side', 'double_bottom_hopper_side');--> statement-breakpoint
CREATE TYPE "public"."tank_side" AS ENUM('port', 'starboard', 'centre');--> statement-breakpoint
CREATE TYPE "public"."twenty_percent_rule" AS ENUM('table', 'wording');--> statement-breakpoint
CREATE TYPE "public"."vessel_type" AS ENUM('bulk_carrier', 'oil_tanker', 'chemical_tanker', 'product_tanker', 'gas_carrier', 'container_ship', 'general_cargo', 'ro_ro', 'other');--> statement-breakpoint
CREATE TABLE "anode_records" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"anode_kind" "anode_kind",
	"installed_count" integer NOT NULL,
	"inspected_count" integer NOT NULL,
	"mean_wastage_pct" numeric NOT NULL,
	"min_wastage_pct" numeric,
	"max_wastage_pct" numeric,
	"to_renew_count" integer DEFAULT 0 NOT NULL,
	"appear_unused" boolean DEFAULT false NOT NULL,
	"note" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "anode_records_inspection_id_unique" UNIQUE("inspection_id")
);
--> statement-breakpoint
CREATE TABLE "api_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"name" text NOT NULL,
	"token_hash" text NOT NULL,
	"last_used_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "api_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "atmosphere_readings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"entry_record_id" uuid NOT NULL,
	"tested_at" timestamp with time zone NOT NULL,
	"oxygen_pct" numeric NOT NULL,
	"flammable_lfl_pct" numeric NOT NULL,
	"h2s_ppm" numeric NOT NULL,
	"co_ppm" numeric NOT NULL,
	"co2_pct" numeric,
	"measured_by" text NOT NULL,
	"instrument" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"org_id" uuid,
	"actor_user_id" uuid,
	"action" text NOT NULL,
	"entity" text NOT NULL,
	"entity_id" text,
	"detail" jsonb,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "coating_areas" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"area" "coating_area" NOT NULL,
	"breakdown_pct" numeric NOT NULL,
	"rusted_pct" numeric NOT NULL,
	"hard_scale_pct" numeric NOT NULL,
	"edges_rusted_pct" numeric,
	"location" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "coating_areas_unique" UNIQUE("inspection_id","area"),
	CONSTRAINT "coating_areas_pct" CHECK ("coating_areas"."breakdown_pct" between 0 and 100 and "coating_areas"."rusted_pct" between 0 and 100 and "coating_areas"."hard_scale_pct" between 0 and 100)
);
--> statement-breakpoint
CREATE TABLE "comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"finding_id" uuid,
	"author_id" uuid NOT NULL,
	"kind" text DEFAULT 'comment' NOT NULL,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "cost_rates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"kind" "cost_rate_kind" NOT NULL,
	"amount" numeric(14, 4) NOT NULL,
	"currency" text NOT NULL,
	"place" text,
	"valid_from" date NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "cost_rates_amount_nonneg" CHECK ("cost_rates"."amount" >= 0),
	CONSTRAINT "cost_rates_currency_iso" CHECK ("cost_rates"."currency" ~ '^[A-Z]{3}$')
);
--> statement-breakpoint
CREATE TABLE "docking_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"docking_id" uuid NOT NULL,
	"tank_id" uuid,
	"finding_id" uuid,
	"kind" "docking_item_kind" NOT NULL,
	"description" text NOT NULL,
	"quantity" numeric NOT NULL,
	"unit" text NOT NULL,
	"adjusted_quantity" numeric,
	"included" boolean DEFAULT true NOT NULL,
	"adjustment_reason" text,
	"done_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dockings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"yard" text NOT NULL,
	"place" text NOT NULL,
	"planned_on" date NOT NULL,
	"currency" text NOT NULL,
	"steel_rate_per_kg" numeric(14, 4) NOT NULL,
	"coating_rate_per_m2" numeric(14, 4) NOT NULL,
	"anode_rate_per_piece" numeric(14, 4) NOT NULL,
	"sediment_rate_per_m3" numeric(14, 4) NOT NULL,
	"status" "docking_status" DEFAULT 'planned' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "dockings_currency_iso" CHECK ("dockings"."currency" ~ '^[A-Z]{3}$')
);
--> statement-breakpoint
CREATE TABLE "drawings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"kind" "drawing_kind" NOT NULL,
	"title" text NOT NULL,
	"object_key" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"sha256" text,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "drawings_object_key_unique" UNIQUE("object_key")
);
--> statement-breakpoint
CREATE TABLE "email_deliveries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"report_file_id" uuid,
	"purpose" text NOT NULL,
	"recipient" text NOT NULL,
	"status" "delivery_status" DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"message_id" text,
	"queued_by" uuid,
	"sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "entry_records" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"permit_ref" text,
	"rule_set" "atmosphere_rule_set" NOT NULL,
	"standby_person" text,
	"ventilation" text,
	"rescue_equipment_ready" boolean,
	"communications_tested" boolean,
	"entry_team" text[],
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "entry_records_inspection_id_unique" UNIQUE("inspection_id")
);
--> statement-breakpoint
CREATE TABLE "findings" (
	"id" uuid PRIMARY KEY NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"type" "finding_type" NOT NULL,
	"frame_from" integer NOT NULL,
	"frame_to" integer NOT NULL,
	"plating_region" "plating_region",
	"member_kind" "member_kind" NOT NULL,
	"member_number" integer,
	"position_detail" text,
	"length_mm" numeric,
	"width_mm" numeric,
	"depth_mm" numeric,
	"pit_depth_mm" numeric,
	"affected_length_mm" numeric,
	"as_built_thickness_mm" numeric,
	"measured_thickness_mm" numeric,
	"description" text NOT NULL,
	"repair_kind" "repair_kind" NOT NULL,
	"repair" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"steel_weight_kg" numeric,
	"coating_repair_m2" numeric,
	"status" "finding_status" DEFAULT 'open' NOT NULL,
	"recurring_of_finding_id" uuid,
	"closed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "findings_inspection_number" UNIQUE("inspection_id","number"),
	CONSTRAINT "findings_frames" CHECK ("findings"."frame_from" <= "findings"."frame_to")
);
--> statement-breakpoint
CREATE TABLE "inspection_intervals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid,
	"default_months" integer NOT NULL,
	"below_good_months" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "inspection_intervals_scope" UNIQUE NULLS NOT DISTINCT("org_id","vessel_id"),
	CONSTRAINT "inspection_intervals_positive" CHECK ("inspection_intervals"."default_months" > 0 and "inspection_intervals"."below_good_months" > 0)
);
--> statement-breakpoint
CREATE TABLE "inspections" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"tank_id" uuid NOT NULL,
	"series_id" uuid DEFAULT gen_random_uuid() NOT NULL,
	"revision" integer DEFAULT 1 NOT NULL,
	"previous_revision_id" uuid,
	"status" "inspection_status" DEFAULT 'draft' NOT NULL,
	"inspected_on" date NOT NULL,
	"place_kind" "place_kind" NOT NULL,
	"place" text NOT NULL,
	"team" text[] DEFAULT '{}'::text[] NOT NULL,
	"remarks" jsonb,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"submitted_at" timestamp with time zone,
	"countersigned_at" timestamp with time zone,
	"locked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "inspections_series_revision" UNIQUE("series_id","revision")
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"vessel_id" uuid,
	"role" "role" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_unique" UNIQUE NULLS NOT DISTINCT("user_id","org_id","vessel_id","role"),
	CONSTRAINT "memberships_vessel_scope" CHECK (("memberships"."role" in ('officer','master')) = ("memberships"."vessel_id" is not null))
);
--> statement-breakpoint
CREATE TABLE "not_inspected_areas" (
	"id" uuid PRIMARY KEY NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"frame_from" integer NOT NULL,
	"frame_to" integer NOT NULL,
	"plating_region" "plating_region",
	"member_kind" "member_kind",
	"member_number" integer,
	"reason" "not_inspected_reason" NOT NULL,
	"suspected" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "org_settings" (
	"org_id" uuid PRIMARY KEY NOT NULL,
	"atmosphere_rule_set" "atmosphere_rule_set" DEFAULT 'msc581' NOT NULL,
	"twenty_percent_rule" "twenty_percent_rule" DEFAULT 'table' NOT NULL,
	"anode_renew_threshold_pct" numeric DEFAULT 50 NOT NULL,
	"substantial_corrosion_fraction" numeric DEFAULT 0.75 NOT NULL,
	"attachment_limit_bytes" integer DEFAULT 10485760 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "organisations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "organisations_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "password_reset_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "password_reset_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" uuid PRIMARY KEY NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"finding_id" uuid,
	"kind" "photo_kind" NOT NULL,
	"overview_photo_id" uuid,
	"frame_from" integer,
	"frame_to" integer,
	"plating_region" "plating_region",
	"member_kind" "member_kind",
	"member_number" integer,
	"caption" text,
	"status" "photo_status" DEFAULT 'awaiting_upload' NOT NULL,
	"original_key" text NOT NULL,
	"report_key" text,
	"thumb_key" text,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"width" integer,
	"height" integer,
	"captured_at" timestamp with time zone,
	"file_label" text,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"uploaded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_original_key_unique" UNIQUE("original_key"),
	CONSTRAINT "photos_overview_link" CHECK ("photos"."kind" = 'close_up' or "photos"."overview_photo_id" is null)
);
--> statement-breakpoint
CREATE TABLE "report_files" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"object_key" text NOT NULL,
	"sha256" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "report_files_inspection_id_unique" UNIQUE("inspection_id"),
	CONSTRAINT "report_files_object_key_unique" UNIQUE("object_key"),
	CONSTRAINT "report_files_sha256_unique" UNIQUE("sha256"),
	CONSTRAINT "report_files_sha256" CHECK ("report_files"."sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "report_shares" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"surveyor_user_id" uuid NOT NULL,
	"shared_by" uuid,
	"shared_at" timestamp with time zone DEFAULT now() NOT NULL,
	"acknowledged_at" timestamp with time zone,
	"acknowledgement_comment" text,
	CONSTRAINT "report_shares_unique" UNIQUE("inspection_id","surveyor_user_id")
);
--> statement-breakpoint
CREATE TABLE "sediment_zones" (
	"id" uuid PRIMARY KEY NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"label" text NOT NULL,
	"frame_from" integer,
	"frame_to" integer,
	"depth_mm" numeric NOT NULL,
	"area_m2" numeric NOT NULL,
	"length_m" numeric,
	"breadth_m" numeric,
	"volume_m3" numeric NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "signatures" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"kind" "signature_kind" NOT NULL,
	"signer_name" text NOT NULL,
	"signer_rank" text,
	"typed_signature" text,
	"drawn_signature_key" text,
	"signed_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "signatures_once" UNIQUE("inspection_id","kind")
);
--> statement-breakpoint
CREATE TABLE "special_frames" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"tank_id" uuid NOT NULL,
	"frame" integer NOT NULL,
	"note" text NOT NULL,
	CONSTRAINT "special_frames_unique" UNIQUE("tank_id","frame")
);
--> statement-breakpoint
CREATE TABLE "tank_members" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"tank_id" uuid NOT NULL,
	"kind" "member_kind" NOT NULL,
	"plating_region" "plating_region",
	"number_from" integer,
	"number_to" integer,
	"numbering" "stringer_numbering",
	"frames" integer[],
	"has_centre_girder" boolean,
	"label" text,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "tank_members_range" CHECK ("tank_members"."number_from" is null or "tank_members"."number_to" is null or "tank_members"."number_from" <= "tank_members"."number_to")
);
--> statement-breakpoint
CREATE TABLE "tanks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"side" "tank_side" NOT NULL,
	"kind" "tank_kind" NOT NULL,
	"frame_from" integer NOT NULL,
	"frame_to" integer NOT NULL,
	"bottom_area_m2" numeric,
	"coating_system" "coating_system" DEFAULT 'hard' NOT NULL,
	"heated_boundary" text,
	"at_waterline" boolean DEFAULT false NOT NULL,
	"at_collision_bulkhead" boolean DEFAULT false NOT NULL,
	"note" text,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "tanks_vessel_code" UNIQUE("vessel_id","code"),
	CONSTRAINT "tanks_frames" CHECK ("tanks"."frame_from" < "tanks"."frame_to"),
	CONSTRAINT "tanks_area_positive" CHECK ("tanks"."bottom_area_m2" is null or "tanks"."bottom_area_m2" > 0)
);
--> statement-breakpoint
CREATE TABLE "thickness_margins" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"plating_region" "plating_region",
	"member_kind" "member_kind",
	"allowable_diminution_mm" numeric,
	"allowable_diminution_pct" numeric,
	"source" text NOT NULL,
	CONSTRAINT "thickness_margins_scope" UNIQUE NULLS NOT DISTINCT("vessel_id","plating_region","member_kind"),
	CONSTRAINT "thickness_margins_one_value" CHECK (("thickness_margins"."allowable_diminution_mm" is null) <> ("thickness_margins"."allowable_diminution_pct" is null))
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"rank" text,
	"password_hash" text NOT NULL,
	"failed_sign_ins" integer DEFAULT 0 NOT NULL,
	"locked_until" timestamp with time zone,
	"last_sign_in_at" timestamp with time zone,
	"disabled_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_lower" CHECK ("users"."email" = lower("users"."email"))
);
--> statement-breakpoint
CREATE TABLE "vessel_recipients" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"kind" "recipient_kind" NOT NULL,
	"name" text,
	"email" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vessel_recipients_unique" UNIQUE("vessel_id","email")
);
--> statement-breakpoint
CREATE TABLE "vessels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"name" text NOT NULL,
	"imo_number" text NOT NULL,
	"vessel_type" "vessel_type" NOT NULL,
	"flag" text,
	"class_society" text,
	"year_built" integer,
	"frame_first" integer DEFAULT 0 NOT NULL,
	"frame_last" integer NOT NULL,
	"frame_spacing_mm" integer,
	"midship_from_frame" integer,
	"midship_to_frame" integer,
	"engine_room_fwd_bulkhead_frame" integer,
	"collision_bulkhead_frame" integer,
	"utc_offset_minutes" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vessels_org_imo" UNIQUE("org_id","imo_number"),
	CONSTRAINT "vessels_imo_format" CHECK ("vessels"."imo_number" ~ '^[0-9]{7}$'),
	CONSTRAINT "vessels_frames" CHECK ("vessels"."frame_first" < "vessels"."frame_last")
);
--> statement-breakpoint
ALTER TABLE "anode_records" ADD CONSTRAINT "anode_records_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "anode_records" ADD CONSTRAINT "anode_records_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD CONSTRAINT "api_tokens_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD CONSTRAINT "api_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "atmosphere_readings" ADD CONSTRAINT "atmosphere_readings_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "atmosphere_readings" ADD CONSTRAINT "atmosphere_readings_entry_record_id_entry_records_id_fk" FOREIGN KEY ("entry_record_id") REFERENCES "public"."entry_records"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_log" ADD CONSTRAINT "audit_log_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_log" ADD CONSTRAINT "audit_log_actor_user_id_users_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "coating_areas" ADD CONSTRAINT "coating_areas_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "coating_areas" ADD CONSTRAINT "coating_areas_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cost_rates" ADD CONSTRAINT "cost_rates_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_docking_id_dockings_id_fk" FOREIGN KEY ("docking_id") REFERENCES "public"."dockings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_tank_id_tanks_id_fk" FOREIGN KEY ("tank_id") REFERENCES "public"."tanks"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "docking_items" ADD CONSTRAINT "docking_items_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dockings" ADD CONSTRAINT "dockings_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dockings" ADD CONSTRAINT "dockings_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dockings" ADD CONSTRAINT "dockings_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drawings" ADD CONSTRAINT "drawings_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drawings" ADD CONSTRAINT "drawings_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drawings" ADD CONSTRAINT "drawings_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "email_deliveries" ADD CONSTRAINT "email_deliveries_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "email_deliveries" ADD CONSTRAINT "email_deliveries_report_file_id_report_files_id_fk" FOREIGN KEY ("report_file_id") REFERENCES "public"."report_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "email_deliveries" ADD CONSTRAINT "email_deliveries_queued_by_users_id_fk" FOREIGN KEY ("queued_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_records" ADD CONSTRAINT "entry_records_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_records" ADD CONSTRAINT "entry_records_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_recurring_of_finding_id_findings_id_fk" FOREIGN KEY ("recurring_of_finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspection_intervals" ADD CONSTRAINT "inspection_intervals_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspection_intervals" ADD CONSTRAINT "inspection_intervals_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_tank_id_tanks_id_fk" FOREIGN KEY ("tank_id") REFERENCES "public"."tanks"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_previous_revision_id_inspections_id_fk" FOREIGN KEY ("previous_revision_id") REFERENCES "public"."inspections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "not_inspected_areas" ADD CONSTRAINT "not_inspected_areas_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "not_inspected_areas" ADD CONSTRAINT "not_inspected_areas_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "org_settings" ADD CONSTRAINT "org_settings_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_reset_tokens" ADD CONSTRAINT "password_reset_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_overview_photo_id_photos_id_fk" FOREIGN KEY ("overview_photo_id") REFERENCES "public"."photos"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_files" ADD CONSTRAINT "report_files_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_files" ADD CONSTRAINT "report_files_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_surveyor_user_id_users_id_fk" FOREIGN KEY ("surveyor_user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_shared_by_users_id_fk" FOREIGN KEY ("shared_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sediment_zones" ADD CONSTRAINT "sediment_zones_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sediment_zones" ADD CONSTRAINT "sediment_zones_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "special_frames" ADD CONSTRAINT "special_frames_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "special_frames" ADD CONSTRAINT "special_frames_tank_id_tanks_id_fk" FOREIGN KEY ("tank_id") REFERENCES "public"."tanks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tank_members" ADD CONSTRAINT "tank_members_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tank_members" ADD CONSTRAINT "tank_members_tank_id_tanks_id_fk" FOREIGN KEY ("tank_id") REFERENCES "public"."tanks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tanks" ADD CONSTRAINT "tanks_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tanks" ADD CONSTRAINT "tanks_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "thickness_margins" ADD CONSTRAINT "thickness_margins_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "thickness_margins" ADD CONSTRAINT "thickness_margins_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vessel_recipients" ADD CONSTRAINT "vessel_recipients_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vessel_recipients" ADD CONSTRAINT "vessel_recipients_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vessels" ADD CONSTRAINT "vessels_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "api_tokens_user_idx" ON "api_tokens" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "atmosphere_readings_entry_idx" ON "atmosphere_readings" USING btree ("entry_record_id","tested_at");--> statement-breakpoint
CREATE INDEX "audit_log_org_at_idx" ON "audit_log" USING btree ("org_id","at");--> statement-breakpoint
CREATE INDEX "audit_log_entity_idx" ON "audit_log" USING btree ("entity","entity_id");--> statement-breakpoint
CREATE INDEX "comments_inspection_idx" ON "comments" USING btree ("org_id","inspection_id","created_at");--> statement-breakpoint
CREATE INDEX "cost_rates_org_kind_idx" ON "cost_rates" USING btree ("org_id","kind","valid_from");--> statement-breakpoint
CREATE INDEX "docking_items_docking_idx" ON "docking_items" USING btree ("org_id","docking_id");--> statement-breakpoint
CREATE INDEX "dockings_vessel_idx" ON "dockings" USING btree ("org_id","vessel_id","planned_on");--> statement-breakpoint
CREATE INDEX "drawings_vessel_idx" ON "drawings" USING btree ("org_id","vessel_id");--> statement-breakpoint
CREATE INDEX "email_deliveries_report_idx" ON "email_deliveries" USING btree ("org_id","report_file_id");--> statement-breakpoint
CREATE INDEX "findings_org_inspection_idx" ON "findings" USING btree ("org_id","inspection_id");--> statement-breakpoint
CREATE INDEX "inspections_tank_idx" ON "inspections" USING btree ("org_id","tank_id","inspected_on");--> statement-breakpoint
CREATE INDEX "inspections_vessel_status_idx" ON "inspections" USING btree ("org_id","vessel_id","status");--> statement-breakpoint
CREATE INDEX "memberships_user_idx" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "memberships_vessel_idx" ON "memberships" USING btree ("vessel_id");--> statement-breakpoint
CREATE INDEX "not_inspected_inspection_idx" ON "not_inspected_areas" USING btree ("inspection_id");--> statement-breakpoint
CREATE INDEX "photos_inspection_idx" ON "photos" USING btree ("org_id","inspection_id","sort_order");--> statement-breakpoint
CREATE INDEX "report_shares_surveyor_idx" ON "report_shares" USING btree ("surveyor_user_id");--> statement-breakpoint
CREATE INDEX "sediment_zones_inspection_idx" ON "sediment_zones" USING btree ("inspection_id");--> statement-breakpoint
CREATE INDEX "tank_members_tank_idx" ON "tank_members" USING btree ("tank_id");--> statement-breakpoint
CREATE INDEX "tanks_org_vessel_idx" ON "tanks" USING btree ("org_id","vessel_id");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE INDEX "vessels_org_idx" ON "vessels" USING btree ("org_id");