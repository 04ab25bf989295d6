// The data model of the whole job: companies and people, the structure map of
// each vessel, inspections with everything recorded in them, signed reports and
// their distribution, and the office's settings, dockings and sharing.
//
// Every row that belongs to a company carries `org_id`, so that every query can
// scope by tenant without a join. Timestamps are timestamptz (UTC).
import { sql } from "drizzle-orm";
import {
  bigserial,
  boolean,
  check,
  date,
  index,
  integer,
  jsonb,
  numeric,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uniqueIndex,
  uuid,
  type AnyPgColumn,
} from "drizzle-orm/pg-core";
import {
  ANODE_KINDS,
  ATMOSPHERE_RULE_SETS,
  COATING_AREAS,
  COATING_SYSTEMS,
  COST_RATE_KINDS,
  DELIVERY_STATUSES,
  DOCKING_ITEM_KINDS,
  DOCKING_STATUSES,
  DRAWING_KINDS,
  FINDING_STATUSES,
  FINDING_TYPES,
  INSPECTION_STATUSES,
  MEMBER_KINDS,
  NOT_INSPECTED_REASONS,
  PHOTO_KINDS,
  PHOTO_STATUSES,
  PLACE_KINDS,
  PLATING_REGIONS,
  RECIPIENT_KINDS,
  REPAIR_KINDS,
  ROLES,
  SIGNATURE_KINDS,
  STRINGER_NUMBERING,
  TANK_KINDS,
  TANK_SIDES,
  TWENTY_PERCENT_RULES,
  UPLOAD_STATUSES,
  VESSEL_TYPES,
} from "@/lib/vocabulary";

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();
const measure = (name: string) => numeric(name, { mode: "number" });

export const roleEnum = pgEnum("role", ROLES);
export const vesselTypeEnum = pgEnum("vessel_type", VESSEL_TYPES);
export const tankSideEnum = pgEnum("tank_side", TANK_SIDES);
export const tankKindEnum = pgEnum("tank_kind", TANK_KINDS);
export const coatingSystemEnum = pgEnum("coating_system", COATING_SYSTEMS);
export const memberKindEnum = pgEnum("member_kind", MEMBER_KINDS);
export const platingRegionEnum = pgEnum("plating_region", PLATING_REGIONS);
export const stringerNumberingEnum = pgEnum("stringer_numbering", STRINGER_NUMBERING);
export const drawingKindEnum = pgEnum("drawing_kind", DRAWING_KINDS);
export const inspectionStatusEnum = pgEnum("inspection_status", INSPECTION_STATUSES);
export const placeKindEnum = pgEnum("place_kind", PLACE_KINDS);
export const atmosphereRuleSetEnum = pgEnum("atmosphere_rule_set", ATMOSPHERE_RULE_SETS);
export const findingTypeEnum = pgEnum("finding_type", FINDING_TYPES);
export const findingStatusEnum = pgEnum("finding_status", FINDING_STATUSES);
export const repairKindEnum = pgEnum("repair_kind", REPAIR_KINDS);
export const coatingAreaEnum = pgEnum("coating_area", COATING_AREAS);
export const anodeKindEnum = pgEnum("anode_kind", ANODE_KINDS);
export const notInspectedReasonEnum = pgEnum("not_inspected_reason", NOT_INSPECTED_REASONS);
export const photoKindEnum = pgEnum("photo_kind", PHOTO_KINDS);
export const photoStatusEnum = pgEnum("photo_status", PHOTO_STATUSES);
export const uploadStatusEnum = pgEnum("upload_status", UPLOAD_STATUSES);
export const signatureKindEnum = pgEnum("signature_kind", SIGNATURE_KINDS);
export const recipientKindEnum = pgEnum("recipient_kind", RECIPIENT_KINDS);
export const deliveryStatusEnum = pgEnum("delivery_status", DELIVERY_STATUSES);
export const costRateKindEnum = pgEnum("cost_rate_kind", COST_RATE_KINDS);
export const dockingStatusEnum = pgEnum("docking_status", DOCKING_STATUSES);
export const dockingItemKindEnum = pgEnum("docking_item_kind", DOCKING_ITEM_KINDS);
export const twentyPercentRuleEnum = pgEnum("twenty_percent_rule", TWENTY_PERCENT_RULES);

// ---------------------------------------------------------------- companies and people

export const organisations = pgTable("organisations", {
  id: uuid("id").primaryKey().defaultRandom(),
  slug: text("slug").notNull().unique(),
  name: text("name").notNull(),
  createdAt: createdAt(),
});

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Stored lower-cased; unique across the product (a surveyor may serve several companies).
    email: text("email").notNull(),
    name: text("name").notNull(),
    rank: text("rank"),
    passwordHash: text("password_hash").notNull(),
    failedSignIns: integer("failed_sign_ins").notNull().default(0),
    lockedUntil: timestamp("locked_until", { withTimezone: true }),
    lastSignInAt: timestamp("last_sign_in_at", { withTimezone: true }),
    disabledAt: timestamp("disabled_at", { withTimezone: true }),
    /** When the password was last set by a reset or a chosen password: sessions signed in before it are no longer accepted. */
    passwordChangedAt: timestamp("password_changed_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("users_email_key").on(t.email), check("users_email_lower", sql`${t.email} = lower(${t.email})`)],
);

/** A role of a user in a company: per vessel for officer and master, company-wide for the others. */
export const memberships = pgTable(
  "memberships",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").references(() => vessels.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("memberships_unique").on(t.userId, t.orgId, t.vesselId, t.role).nullsNotDistinct(),
    index("memberships_user_idx").on(t.userId),
    index("memberships_vessel_idx").on(t.vesselId),
    check(
      "memberships_vessel_scope",
      sql`(${t.role} in ('officer','master')) = (${t.vesselId} is not null)`,
    ),
  ],
);

export const apiTokens = pgTable(
  "api_tokens",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("api_tokens_user_idx").on(t.userId)],
);

export const passwordResetTokens = pgTable("password_reset_tokens", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdAt: createdAt(),
});

// ---------------------------------------------------------------- company settings

/** One row per company: the rule choices and thresholds the office sets. */
export const orgSettings = pgTable("org_settings", {
  orgId: uuid("org_id").primaryKey().references(() => organisations.id, { onDelete: "cascade" }),
  atmosphereRuleSet: atmosphereRuleSetEnum("atmosphere_rule_set").notNull().default("msc581"),
  twentyPercentRule: twentyPercentRuleEnum("twenty_percent_rule").notNull().default("table"),
  anodeRenewThresholdPct: measure("anode_renew_threshold_pct").notNull().default(50),
  substantialCorrosionFraction: measure("substantial_corrosion_fraction").notNull().default(0.75),
  attachmentLimitBytes: integer("attachment_limit_bytes").notNull().default(10 * 1024 * 1024),
  updatedAt: updatedAt(),
});

/** Unit rates the superintendent keeps (sediment removal per m³, steel per kg, …). */
export const costRates = pgTable(
  "cost_rates",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    kind: costRateKindEnum("kind").notNull(),
    amount: numeric("amount", { precision: 14, scale: 4, mode: "number" }).notNull(),
    currency: text("currency").notNull(),
    place: text("place"),
    validFrom: date("valid_from").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("cost_rates_org_kind_idx").on(t.orgId, t.kind, t.validFrom),
    check("cost_rates_amount_nonneg", sql`${t.amount} >= 0`),
    check("cost_rates_currency_iso", sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);

/** Months between inspections: a default, and a shorter one when the coating is below GOOD. */
export const inspectionIntervals = pgTable(
  "inspection_intervals",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").references(() => vessels.id, { onDelete: "cascade" }),
    defaultMonths: integer("default_months").notNull(),
    belowGoodMonths: integer("below_good_months").notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("inspection_intervals_scope").on(t.orgId, t.vesselId).nullsNotDistinct(),
    check("inspection_intervals_positive", sql`${t.defaultMonths} > 0 and ${t.belowGoodMonths} > 0`),
  ],
);

// ---------------------------------------------------------------- vessels and their structure map

export const vessels = pgTable(
  "vessels",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    imoNumber: text("imo_number").notNull(),
    vesselType: vesselTypeEnum("vessel_type").notNull(),
    flag: text("flag"),
    classSociety: text("class_society"),
    yearBuilt: integer("year_built"),
    frameFirst: integer("frame_first").notNull().default(0),
    frameLast: integer("frame_last").notNull(),
    frameSpacingMm: integer("frame_spacing_mm"),
    midshipFromFrame: integer("midship_from_frame"),
    midshipToFrame: integer("midship_to_frame"),
    engineRoomFwdBulkheadFrame: integer("engine_room_fwd_bulkhead_frame"),
    collisionBulkheadFrame: integer("collision_bulkhead_frame"),
    /** The ship's clock against UTC, in minutes, where it is known. */
    utcOffsetMinutes: integer("utc_offset_minutes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("vessels_org_imo").on(t.orgId, t.imoNumber),
    index("vessels_org_idx").on(t.orgId),
    check("vessels_imo_format", sql`${t.imoNumber} ~ '^[0-9]{7}$'`),
    check("vessels_frames", sql`${t.frameFirst} < ${t.frameLast}`),
  ],
);

/** Office and class addresses that receive a vessel's signed reports. */
export const vesselRecipients = pgTable(
  "vessel_recipients",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    kind: recipientKindEnum("kind").notNull(),
    name: text("name"),
    email: text("email").notNull(),
    createdAt: createdAt(),
  },
  (t) => [unique("vessel_recipients_unique").on(t.vesselId, t.email)],
);

export const tanks = pgTable(
  "tanks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    code: text("code").notNull(),
    name: text("name").notNull(),
    side: tankSideEnum("side").notNull(),
    kind: tankKindEnum("kind").notNull(),
    frameFrom: integer("frame_from").notNull(),
    frameTo: integer("frame_to").notNull(),
    bottomAreaM2: measure("bottom_area_m2"),
    coatingSystem: coatingSystemEnum("coating_system").notNull().default("hard"),
    /** Which boundary is shared with a heated tank, if any ("aft bulkhead to No. 4 HFO tank"). */
    heatedBoundary: text("heated_boundary"),
    atWaterline: boolean("at_waterline").notNull().default(false),
    atCollisionBulkhead: boolean("at_collision_bulkhead").notNull().default(false),
    note: text("note"),
    sortOrder: integer("sort_order").notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("tanks_vessel_code").on(t.vesselId, t.code),
    index("tanks_org_vessel_idx").on(t.orgId, t.vesselId),
    check("tanks_frames", sql`${t.frameFrom} < ${t.frameTo}`),
    check("tanks_area_positive", sql`${t.bottomAreaM2} is null or ${t.bottomAreaM2} > 0`),
  ],
);

/**
 * A tank's member catalogue: stringer decks, bottom girders, web frames and the
 * longitudinal sets of each plating region, with their number ranges.
 */
export const tankMembers = pgTable(
  "tank_members",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    tankId: uuid("tank_id").notNull().references(() => tanks.id, { onDelete: "cascade" }),
    kind: memberKindEnum("kind").notNull(),
    /** For longitudinal sets: the plating region they stiffen. */
    platingRegion: platingRegionEnum("plating_region"),
    numberFrom: integer("number_from"),
    numberTo: integer("number_to"),
    /** For stringer decks: counted from the top or from the bottom. */
    numbering: stringerNumberingEnum("numbering"),
    /** For web frames: the frame numbers at which they stand. */
    frames: integer("frames").array(),
    hasCentreGirder: boolean("has_centre_girder"),
    label: text("label"),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [
    index("tank_members_tank_idx").on(t.tankId),
    check(
      "tank_members_range",
      sql`${t.numberFrom} is null or ${t.numberTo} is null or ${t.numberFrom} <= ${t.numberTo}`,
    ),
  ],
);

/** Frames that differ from their neighbours: landmarks inside the tank. */
export const specialFrames = pgTable(
  "special_frames",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    tankId: uuid("tank_id").notNull().references(() => tanks.id, { onDelete: "cascade" }),
    frame: integer("frame").notNull(),
    note: text("note").notNull(),
  },
  (t) => [unique("special_frames_unique").on(t.tankId, t.frame)],
);

/** Allowable thickness diminution the office enters from the vessel's class rules. */
export const thicknessMargins = pgTable(
  "thickness_margins",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    platingRegion: platingRegionEnum("plating_region"),
    memberKind: memberKindEnum("member_kind"),
    allowableDiminutionMm: measure("allowable_diminution_mm"),
    allowableDiminutionPct: measure("allowable_diminution_pct"),
    source: text("source").notNull(),
  },
  (t) => [
    unique("thickness_margins_scope").on(t.vesselId, t.platingRegion, t.memberKind).nullsNotDistinct(),
    check(
      "thickness_margins_one_value",
      sql`(${t.allowableDiminutionMm} is null) <> (${t.allowableDiminutionPct} is null)`,
    ),
  ],
);

/** Uploaded files of the whole product (drawings, photos, PDFs) live in object storage; rows keep the key. */
export const drawings = pgTable(
  "drawings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    kind: drawingKindEnum("kind").notNull(),
    title: text("title").notNull(),
    objectKey: text("object_key").notNull().unique(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    sha256: text("sha256"),
    status: uploadStatusEnum("status").notNull().default("awaiting_upload"),
    /** An upload that has not arrived by then is removed by the clean-up job. */
    uploadExpiresAt: timestamp("upload_expires_at", { withTimezone: true }),
    fileLabel: text("file_label"),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("drawings_vessel_idx").on(t.orgId, t.vesselId), index("drawings_upload_expiry_idx").on(t.uploadExpiresAt).where(sql`status = 'awaiting_upload'`)],
);

// ---------------------------------------------------------------- inspections

export const inspections = pgTable(
  "inspections",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    tankId: uuid("tank_id").notNull().references(() => tanks.id, { onDelete: "restrict" }),
    /** All revisions of one report share the series id; revision counts from 1. */
    seriesId: uuid("series_id").notNull().defaultRandom(),
    revision: integer("revision").notNull().default(1),
    previousRevisionId: uuid("previous_revision_id").references((): AnyPgColumn => inspections.id),
    status: inspectionStatusEnum("status").notNull().default("draft"),
    inspectedOn: date("inspected_on").notNull(),
    placeKind: placeKindEnum("place_kind").notNull(),
    place: text("place").notNull(),
    team: text("team").array().notNull().default(sql`'{}'::text[]`),
    /** Rich-text remarks as editor JSON. */
    remarks: jsonb("remarks"),
    /** Optimistic concurrency: every write must name the version it read. */
    version: integer("version").notNull().default(1),
    /** Explicit statements that a step has nothing to record, so an empty step is not a forgotten one. */
    noFindings: boolean("no_findings").notNull().default(false),
    noSediment: boolean("no_sediment").notNull().default(false),
    allAreasInspected: boolean("all_areas_inspected").notNull().default(false),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    submittedAt: timestamp("submitted_at", { withTimezone: true }),
    countersignedAt: timestamp("countersigned_at", { withTimezone: true }),
    lockedAt: timestamp("locked_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("inspections_series_revision").on(t.seriesId, t.revision),
    index("inspections_tank_idx").on(t.orgId, t.tankId, t.inspectedOn),
    index("inspections_vessel_status_idx").on(t.orgId, t.vesselId, t.status),
  ],
);

export const entryRecords = pgTable("entry_records", {
  id: uuid("id").primaryKey().defaultRandom(),
  orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  inspectionId: uuid("inspection_id")
    .notNull()
    .unique()
    .references(() => inspections.id, { onDelete: "cascade" }),
  permitRef: text("permit_ref"),
  ruleSet: atmosphereRuleSetEnum("rule_set").notNull(),
  standbyPerson: text("standby_person"),
  ventilation: text("ventilation"),
  rescueEquipmentReady: boolean("rescue_equipment_ready"),
  communicationsTested: boolean("communications_tested"),
  entryTeam: text("entry_team").array(),
  updatedAt: updatedAt(),
});

/** Each test of the tank's atmosphere; a stop is followed by a new test, never an edit. */
export const atmosphereReadings = pgTable(
  "atmosphere_readings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    entryRecordId: uuid("entry_record_id")
      .notNull()
      .references(() => entryRecords.id, { onDelete: "cascade" }),
    testedAt: timestamp("tested_at", { withTimezone: true }).notNull(),
    oxygenPct: measure("oxygen_pct").notNull(),
    flammableLflPct: measure("flammable_lfl_pct").notNull(),
    h2sPpm: measure("h2s_ppm").notNull(),
    coPpm: measure("co_ppm").notNull(),
    co2Pct: measure("co2_pct"),
    measuredBy: text("measured_by").notNull(),
    instrument: text("instrument"),
    createdAt: createdAt(),
  },
  (t) => [index("atmosphere_readings_entry_idx").on(t.entryRecordId, t.testedAt)],
);

export const findings = pgTable(
  "findings",
  {
    // Chosen by the client so that a retried save cannot create the finding twice.
    id: uuid("id").primaryKey(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    type: findingTypeEnum("type").notNull(),
    frameFrom: integer("frame_from").notNull(),
    frameTo: integer("frame_to").notNull(),
    platingRegion: platingRegionEnum("plating_region"),
    memberKind: memberKindEnum("member_kind").notNull(),
    memberNumber: integer("member_number"),
    positionDetail: text("position_detail"),
    lengthMm: measure("length_mm"),
    widthMm: measure("width_mm"),
    depthMm: measure("depth_mm"),
    pitDepthMm: measure("pit_depth_mm"),
    affectedLengthMm: measure("affected_length_mm"),
    asBuiltThicknessMm: measure("as_built_thickness_mm"),
    measuredThicknessMm: measure("measured_thickness_mm"),
    description: text("description").notNull(),
    repairKind: repairKindEnum("repair_kind").notNull(),
    /** Dimensions of the proposed repair, shaped by its kind (validated by lib/ schemas). */
    repair: jsonb("repair").notNull().default({}),
    /** Computed by lib/ on save, kept for the office's sums. */
    steelWeightKg: measure("steel_weight_kg"),
    coatingRepairM2: measure("coating_repair_m2"),
    status: findingStatusEnum("status").notNull().default("open"),
    /** The same defect found at an earlier inspection of the tank. */
    recurringOfFindingId: uuid("recurring_of_finding_id").references((): AnyPgColumn => findings.id, {
      onDelete: "set null",
    }),
    closedAt: timestamp("closed_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("findings_inspection_number").on(t.inspectionId, t.number),
    index("findings_org_inspection_idx").on(t.orgId, t.inspectionId),
    check("findings_frames", sql`${t.frameFrom} <= ${t.frameTo}`),
  ],
);

export const coatingAreas = pgTable(
  "coating_areas",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    area: coatingAreaEnum("area").notNull(),
    breakdownPct: measure("breakdown_pct").notNull(),
    rustedPct: measure("rusted_pct").notNull(),
    hardScalePct: measure("hard_scale_pct").notNull(),
    /** Share of edges and weld lines rusted, where the area is judged by its edges. */
    edgesRustedPct: measure("edges_rusted_pct"),
    location: text("location"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("coating_areas_unique").on(t.inspectionId, t.area),
    check(
      "coating_areas_pct",
      sql`${t.breakdownPct} between 0 and 100 and ${t.rustedPct} between 0 and 100 and ${t.hardScalePct} between 0 and 100`,
    ),
  ],
);

/**
 * Each tank's latest countersigned inspection (by inspection date, then
 * revision) and the coating rank of its worst area under both readings of the
 * 20 % boundary (0 GOOD, 1 FAIR, 2 POOR, null without a coating record).
 * Kept by database triggers on inspections and coating_areas (migration
 * 0004_tank-latest), so every write path keeps it true; the fleet overview and
 * the work list read it instead of searching every tank's inspections per request.
 */
export const tankLatestInspections = pgTable(
  "tank_latest_inspections",
  {
    tankId: uuid("tank_id")
      .primaryKey()
      .references(() => tanks.id, { onDelete: "cascade" }),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    inspectedOn: date("inspected_on").notNull(),
    revision: integer("revision").notNull(),
    /** The tank's rank with the 20 % boundary read as in the table (> 20 % is POOR). */
    rankTable: integer("rank_table"),
    /** The tank's rank with the 20 % boundary read as in the wording (20 % is POOR). */
    rankWording: integer("rank_wording"),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("tank_latest_org_vessel_idx").on(t.orgId, t.vesselId), index("tank_latest_inspection_idx").on(t.inspectionId)],
);

export const anodeRecords = pgTable("anode_records", {
  id: uuid("id").primaryKey().defaultRandom(),
  orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
  inspectionId: uuid("inspection_id")
    .notNull()
    .unique()
    .references(() => inspections.id, { onDelete: "cascade" }),
  anodeKind: anodeKindEnum("anode_kind"),
  installedCount: integer("installed_count").notNull(),
  inspectedCount: integer("inspected_count").notNull(),
  meanWastagePct: measure("mean_wastage_pct").notNull(),
  minWastagePct: measure("min_wastage_pct"),
  maxWastagePct: measure("max_wastage_pct"),
  toRenewCount: integer("to_renew_count").notNull().default(0),
  appearUnused: boolean("appear_unused").notNull().default(false),
  note: text("note"),
  updatedAt: updatedAt(),
});

export const sedimentZones = pgTable(
  "sediment_zones",
  {
    id: uuid("id").primaryKey(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    frameFrom: integer("frame_from"),
    frameTo: integer("frame_to"),
    depthMm: measure("depth_mm").notNull(),
    areaM2: measure("area_m2").notNull(),
    lengthM: measure("length_m"),
    breadthM: measure("breadth_m"),
    volumeM3: measure("volume_m3").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("sediment_zones_inspection_idx").on(t.inspectionId)],
);

export const notInspectedAreas = pgTable(
  "not_inspected_areas",
  {
    id: uuid("id").primaryKey(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    frameFrom: integer("frame_from").notNull(),
    frameTo: integer("frame_to").notNull(),
    platingRegion: platingRegionEnum("plating_region"),
    memberKind: memberKindEnum("member_kind"),
    memberNumber: integer("member_number"),
    reason: notInspectedReasonEnum("reason").notNull(),
    suspected: text("suspected"),
    createdAt: createdAt(),
  },
  (t) => [index("not_inspected_inspection_idx").on(t.inspectionId)],
);

export const photos = pgTable(
  "photos",
  {
    id: uuid("id").primaryKey(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    findingId: uuid("finding_id").references(() => findings.id, { onDelete: "set null" }),
    kind: photoKindEnum("kind").notNull(),
    overviewPhotoId: uuid("overview_photo_id").references((): AnyPgColumn => photos.id, {
      onDelete: "restrict",
    }),
    frameFrom: integer("frame_from"),
    frameTo: integer("frame_to"),
    platingRegion: platingRegionEnum("plating_region"),
    memberKind: memberKindEnum("member_kind"),
    memberNumber: integer("member_number"),
    caption: text("caption"),
    status: photoStatusEnum("status").notNull().default("awaiting_upload"),
    originalKey: text("original_key").notNull().unique(),
    reportKey: text("report_key"),
    thumbKey: text("thumb_key"),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    width: integer("width"),
    height: integer("height"),
    capturedAt: timestamp("captured_at", { withTimezone: true }),
    /** Why the background job refused the image (it could not be decoded). */
    statusMessage: text("status_message"),
    uploadExpiresAt: timestamp("upload_expires_at", { withTimezone: true }),
    fileLabel: text("file_label"),
    sortOrder: integer("sort_order").notNull().default(0),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("photos_inspection_idx").on(t.orgId, t.inspectionId, t.sortOrder),
    index("photos_upload_expiry_idx").on(t.uploadExpiresAt).where(sql`status = 'awaiting_upload'`),
    check("photos_overview_link", sql`${t.kind} = 'close_up' or ${t.overviewPhotoId} is null`),
  ],
);

export const signatures = pgTable(
  "signatures",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "restrict" }),
    kind: signatureKindEnum("kind").notNull(),
    signerName: text("signer_name").notNull(),
    signerRank: text("signer_rank"),
    typedSignature: text("typed_signature"),
    drawnSignatureKey: text("drawn_signature_key"),
    signedAt: timestamp("signed_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique("signatures_once").on(t.inspectionId, t.kind)],
);

/** A rendered PDF: the signed report (with its fingerprint), a brief or a work list. */
export const reportFiles = pgTable(
  "report_files",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .unique()
      .references(() => inspections.id, { onDelete: "restrict" }),
    objectKey: text("object_key").notNull().unique(),
    sha256: text("sha256").notNull().unique(),
    sizeBytes: integer("size_bytes").notNull(),
    createdAt: createdAt(),
  },
  (t) => [check("report_files_sha256", sql`${t.sha256} ~ '^[0-9a-f]{64}$'`)],
);

export const emailDeliveries = pgTable(
  "email_deliveries",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    reportFileId: uuid("report_file_id").references(() => reportFiles.id, { onDelete: "set null" }),
    purpose: text("purpose").notNull(),
    recipient: text("recipient").notNull(),
    status: deliveryStatusEnum("status").notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    messageId: text("message_id"),
    /** How the PDF went: "attachment", or "link" (a download link that expires) when it is over the size limit. */
    method: text("method"),
    linkExpiresAt: timestamp("link_expires_at", { withTimezone: true }),
    queuedBy: uuid("queued_by").references(() => users.id, { onDelete: "set null" }),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("email_deliveries_report_idx").on(t.orgId, t.reportFileId)],
);

/** Comments on a report or one of its findings; a master's return comments are of kind "return". */
export const comments = pgTable(
  "comments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    findingId: uuid("finding_id").references(() => findings.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").notNull().references(() => users.id, { onDelete: "restrict" }),
    kind: text("kind").notNull().default("comment"),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("comments_inspection_idx").on(t.orgId, t.inspectionId, t.createdAt)],
);

/** A countersigned report shared with a class surveyor, and the surveyor's acknowledgement. */
export const reportShares = pgTable(
  "report_shares",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    inspectionId: uuid("inspection_id")
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    surveyorUserId: uuid("surveyor_user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    sharedBy: uuid("shared_by").references(() => users.id, { onDelete: "set null" }),
    sharedAt: timestamp("shared_at", { withTimezone: true }).notNull().defaultNow(),
    acknowledgedAt: timestamp("acknowledged_at", { withTimezone: true }),
    acknowledgementComment: text("acknowledgement_comment"),
  },
  (t) => [
    unique("report_shares_unique").on(t.inspectionId, t.surveyorUserId),
    index("report_shares_surveyor_idx").on(t.surveyorUserId),
  ],
);

// ---------------------------------------------------------------- dockings

export const dockings = pgTable(
  "dockings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    vesselId: uuid("vessel_id").notNull().references(() => vessels.id, { onDelete: "cascade" }),
    yard: text("yard").notNull(),
    place: text("place").notNull(),
    plannedOn: date("planned_on").notNull(),
    currency: text("currency").notNull(),
    steelRatePerKg: numeric("steel_rate_per_kg", { precision: 14, scale: 4, mode: "number" }).notNull(),
    coatingRatePerM2: numeric("coating_rate_per_m2", { precision: 14, scale: 4, mode: "number" }).notNull(),
    anodeRatePerPiece: numeric("anode_rate_per_piece", { precision: 14, scale: 4, mode: "number" }).notNull(),
    sedimentRatePerM3: numeric("sediment_rate_per_m3", { precision: 14, scale: 4, mode: "number" }).notNull(),
    status: dockingStatusEnum("status").notNull().default("planned"),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("dockings_vessel_idx").on(t.orgId, t.vesselId, t.plannedOn),
    check("dockings_currency_iso", sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);

export const dockingItems = pgTable(
  "docking_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    dockingId: uuid("docking_id")
      .notNull()
      .references(() => dockings.id, { onDelete: "cascade" }),
    tankId: uuid("tank_id").references(() => tanks.id, { onDelete: "set null" }),
    findingId: uuid("finding_id").references(() => findings.id, { onDelete: "set null" }),
    kind: dockingItemKindEnum("kind").notNull(),
    description: text("description").notNull(),
    quantity: measure("quantity").notNull(),
    unit: text("unit").notNull(),
    adjustedQuantity: measure("adjusted_quantity"),
    included: boolean("included").notNull().default(true),
    adjustmentReason: text("adjustment_reason"),
    doneAt: timestamp("done_at", { withTimezone: true }),
    // Hand-added ("other") items only: their own price per unit in the docking's
    // currency, why they were added and by whom. Gathered items are priced at the
    // docking's rates and carry none of these.
    unitRate: numeric("unit_rate", { precision: 14, scale: 4, mode: "number" }),
    addedReason: text("added_reason"),
    addedBy: uuid("added_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("docking_items_docking_idx").on(t.orgId, t.dockingId),
    check("docking_items_own_rate_only_other", sql`(${t.kind} = 'other') = (${t.unitRate} is not null)`),
    check("docking_items_other_has_reason", sql`${t.kind} <> 'other' or ${t.addedReason} is not null`),
  ],
);

/** Responses of writes that carried an Idempotency-Key, so that a retried request is answered, not repeated. */
export const idempotencyKeys = pgTable(
  "idempotency_keys",
  {
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    orgId: uuid("org_id").notNull().references(() => organisations.id, { onDelete: "cascade" }),
    requestHash: text("request_hash").notNull(),
    status: integer("status").notNull(),
    body: jsonb("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.key] }), index("idempotency_keys_created_idx").on(t.createdAt)],
);

// ---------------------------------------------------------------- audit

export const auditLog = pgTable(
  "audit_log",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    orgId: uuid("org_id").references(() => organisations.id, { onDelete: "cascade" }),
    actorUserId: uuid("actor_user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    entity: text("entity").notNull(),
    entityId: text("entity_id"),
    detail: jsonb("detail"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_log_org_at_idx").on(t.orgId, t.at), index("audit_log_entity_idx").on(t.entity, t.entityId)],
);
