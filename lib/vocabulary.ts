// The fixed vocabularies of the product, shared by the database enums, the zod
// schemas and the screens. Each list is paired with the labels a person reads.

export const ROLES = ["officer", "master", "superintendent", "admin", "surveyor"] as const;
export type TRole = (typeof ROLES)[number];
export const ROLE_LABELS: Record<TRole, string> = {
  officer: "Officer",
  master: "Master",
  superintendent: "Superintendent",
  admin: "Administrator",
  surveyor: "Class surveyor",
};
/** Roles held for one vessel; the others apply company-wide. */
export const VESSEL_ROLES = ["officer", "master"] as const satisfies readonly TRole[];
export const COMPANY_ROLES = ["superintendent", "admin", "surveyor"] as const satisfies readonly TRole[];

export const VESSEL_TYPES = [
  "bulk_carrier",
  "oil_tanker",
  "chemical_tanker",
  "product_tanker",
  "gas_carrier",
  "container_ship",
  "general_cargo",
  "ro_ro",
  "other",
] as const;
export type TVesselType = (typeof VESSEL_TYPES)[number];
export const VESSEL_TYPE_LABELS: Record<TVesselType, string> = {
  bulk_carrier: "Bulk carrier",
  oil_tanker: "Oil tanker",
  chemical_tanker: "Chemical tanker",
  product_tanker: "Product tanker",
  gas_carrier: "Gas carrier",
  container_ship: "Container ship",
  general_cargo: "General cargo ship",
  ro_ro: "Ro-ro ship",
  other: "Other",
};

export const TANK_SIDES = ["port", "starboard", "centre"] as const;
export type TTankSide = (typeof TANK_SIDES)[number];
export const TANK_SIDE_LABELS: Record<TTankSide, string> = { port: "Port", starboard: "Starboard", centre: "Centre" };

export const TANK_KINDS = [
  "double_bottom",
  "hopper",
  "side",
  "top_side",
  "fore_peak",
  "aft_peak",
  "double_bottom_hopper",
  "double_bottom_side",
  "hopper_side",
  "double_bottom_hopper_side",
] as const;
export type TTankKind = (typeof TANK_KINDS)[number];
export const TANK_KIND_LABELS: Record<TTankKind, string> = {
  double_bottom: "Double bottom",
  hopper: "Hopper",
  side: "Side",
  top_side: "Top side",
  fore_peak: "Fore peak",
  aft_peak: "Aft peak",
  double_bottom_hopper: "Double bottom + hopper",
  double_bottom_side: "L-shaped: double bottom + side",
  hopper_side: "Hopper + side",
  double_bottom_hopper_side: "U/L-shaped: double bottom + hopper + side",
};

export const COATING_SYSTEMS = ["hard", "semi_hard", "soft", "none"] as const;

export const MEMBER_KINDS = [
  "plating",
  "longitudinal",
  "stringer_deck",
  "bottom_girder",
  "web_frame",
  "transverse_frame",
  "bracket",
  "bulkhead",
  "manhole",
  "bell_mouth",
  "piping",
  "other",
] as const;
export type TMemberKind = (typeof MEMBER_KINDS)[number];
export const MEMBER_KIND_LABELS: Record<TMemberKind, string> = {
  plating: "Plating",
  longitudinal: "Longitudinal",
  stringer_deck: "Stringer deck",
  bottom_girder: "Bottom girder",
  web_frame: "Web frame",
  transverse_frame: "Transverse frame",
  bracket: "Bracket",
  bulkhead: "Bulkhead",
  manhole: "Manhole",
  bell_mouth: "Bell mouth",
  piping: "Piping",
  other: "Other",
};

export const PLATING_REGIONS = [
  "inner_bottom",
  "bottom_shell",
  "lower_hopper",
  "side_shell",
  "longitudinal_bulkhead",
  "upper_hopper",
  "main_deck",
  "transverse_bulkhead",
] as const;
export type TPlatingRegion = (typeof PLATING_REGIONS)[number];
export const PLATING_REGION_LABELS: Record<TPlatingRegion, string> = {
  inner_bottom: "Inner bottom",
  bottom_shell: "Bottom shell",
  lower_hopper: "Lower hopper",
  side_shell: "Side shell",
  longitudinal_bulkhead: "Longitudinal bulkhead",
  upper_hopper: "Upper hopper / top side",
  main_deck: "Main deck",
  transverse_bulkhead: "Transverse bulkhead",
};

export const STRINGER_NUMBERING = ["from_top", "from_bottom"] as const;
export const DRAWING_KINDS = ["general_arrangement", "midship_section", "shell_expansion", "other"] as const;
export type TDrawingKind = (typeof DRAWING_KINDS)[number];
export const DRAWING_KIND_LABELS: Record<TDrawingKind, string> = {
  general_arrangement: "General arrangement",
  midship_section: "Midship section",
  shell_expansion: "Shell expansion",
  other: "Other drawing",
};

export const INSPECTION_STATUSES = ["draft", "submitted", "returned", "countersigned", "superseded"] as const;
export type TInspectionStatus = (typeof INSPECTION_STATUSES)[number];
export const PLACE_KINDS = ["port", "at_sea", "dry_dock", "anchorage"] as const;

/** Rule sets for the entry atmosphere; their limits live in lib/ with their sources. */
export const ATMOSPHERE_RULE_SETS = ["msc581", "a1050"] as const;

export const FINDING_TYPES = [
  "crack",
  "dent",
  "buckling",
  "general_corrosion",
  "pitting",
  "grooving",
  "thickness_diminution",
  "coating_breakdown",
  "erosion",
  "contact_damage",
  "loose_fitting",
  "other",
] as const;
export const FINDING_STATUSES = ["open", "monitoring", "closed"] as const;
export const REPAIR_KINDS = [
  "insert_plate",
  "bracket_renewal",
  "profile_renewal",
  "fairing",
  "coating_touch_up",
  "monitor_only",
] as const;

export const COATING_AREAS = [
  "shell_plating",
  "bulkhead_plating",
  "inner_bottom_deck_plating",
  "stringers",
  "girders_web_frames",
  "longitudinals_brackets",
  "edges_welds",
  "piping_fittings",
] as const;
export const ANODE_KINDS = ["aluminium", "zinc", "other"] as const;
export const NOT_INSPECTED_REASONS = [
  "no_staging",
  "water",
  "sediment",
  "blocked_or_closed",
  "time",
  "safety",
  "other",
] as const;
export const PHOTO_KINDS = ["overview", "close_up"] as const;
export type TPhotoKind = (typeof PHOTO_KINDS)[number];
export const PHOTO_KIND_LABELS: Record<TPhotoKind, string> = { overview: "Overview", close_up: "Close-up" };
export const PHOTO_STATUSES = ["awaiting_upload", "processing", "ready", "rejected"] as const;
export type TPhotoStatus = (typeof PHOTO_STATUSES)[number];
export const UPLOAD_STATUSES = ["awaiting_upload", "ready"] as const;
export const SIGNATURE_KINDS = ["officer", "master"] as const;
export const RECIPIENT_KINDS = ["office", "class"] as const;
export const DELIVERY_STATUSES = ["queued", "sent", "failed"] as const;
export const COST_RATE_KINDS = ["steel_per_kg", "coating_per_m2", "anode_per_piece", "sediment_per_m3"] as const;
export const DOCKING_STATUSES = ["planned", "in_progress", "completed", "cancelled"] as const;
export type TDockingStatus = (typeof DOCKING_STATUSES)[number];
export const DOCKING_STATUS_LABELS: Record<TDockingStatus, string> = { planned: "Planned", in_progress: "In progress", completed: "Completed", cancelled: "Cancelled" };
export const DOCKING_ITEM_KINDS = ["steel", "coating", "anodes", "sediment", "other"] as const;
/** How exactly 20 % breakdown is rated: FAIR by the table of definitions, POOR by the older wording. */
export const TWENTY_PERCENT_RULES = ["table", "wording"] as const;

export type TFindingType = (typeof FINDING_TYPES)[number];
export const FINDING_TYPE_LABELS: Record<TFindingType, string> = {
  crack: "Crack",
  dent: "Dent",
  buckling: "Buckling / deformation",
  general_corrosion: "General corrosion",
  pitting: "Pitting",
  grooving: "Grooving",
  thickness_diminution: "Thickness diminution",
  coating_breakdown: "Local coating breakdown",
  erosion: "Cavitation / erosion",
  contact_damage: "Contact damage",
  loose_fitting: "Loose or missing fitting",
  other: "Other",
};

export type TRepairKind = (typeof REPAIR_KINDS)[number];
export const REPAIR_KIND_LABELS: Record<TRepairKind, string> = {
  insert_plate: "Insert plate",
  bracket_renewal: "Bracket renewal",
  profile_renewal: "Profile (longitudinal / stiffener) renewal",
  fairing: "Fairing",
  coating_touch_up: "Coating touch-up",
  monitor_only: "Monitor only",
};
export type TCoatingArea = (typeof COATING_AREAS)[number];
export const COATING_AREA_LABELS: Record<TCoatingArea, string> = {
  shell_plating: "Shell plating",
  bulkhead_plating: "Bulkhead plating",
  inner_bottom_deck_plating: "Inner bottom / deck plating",
  stringers: "Stringers",
  girders_web_frames: "Girders and web frames",
  longitudinals_brackets: "Longitudinals and brackets",
  edges_welds: "Edges and welds",
  piping_fittings: "Piping and fittings",
};
export type TNotInspectedReason = (typeof NOT_INSPECTED_REASONS)[number];
export const NOT_INSPECTED_REASON_LABELS: Record<TNotInspectedReason, string> = {
  no_staging: "No staging / access at height",
  water: "Water in the tank",
  sediment: "Covered by sediment",
  blocked_or_closed: "Blocked or closed",
  time: "Not enough time",
  safety: "Safety",
  other: "Other",
};
export type TPlaceKind = (typeof PLACE_KINDS)[number];
export const PLACE_KIND_LABELS: Record<TPlaceKind, string> = { port: "In port", at_sea: "At sea", dry_dock: "In dry dock", anchorage: "At anchor" };
export const INSPECTION_STATUS_LABELS: Record<TInspectionStatus, string> = {
  draft: "Draft",
  submitted: "Submitted",
  returned: "Returned with comments",
  countersigned: "Countersigned",
  superseded: "Superseded",
};
export type TRecipientKind = (typeof RECIPIENT_KINDS)[number];
export const RECIPIENT_KIND_LABELS: Record<TRecipientKind, string> = { office: "Office", class: "Class society" };
