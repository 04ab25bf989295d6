// The areas of concern of a tank's brief: a table of rules, each choosing
// itself from the tank's kind, flags and position, with what to look for and
// why, in our own words. The rules are common practice of tank inspection.
import type { TTankKind } from "@/lib/vocabulary";
import type { TTankPosition } from "./position";

export type TConcernContext = {
  kind: TTankKind;
  vesselType: string;
  atWaterline: boolean;
  heatedBoundary: string | null;
  position: TTankPosition;
};

export type TConcern = { id: string; title: string; lookFor: string; why: string };

type TRule = TConcern & { applies: (c: TConcernContext) => boolean; because: (c: TConcernContext) => string };

const BOTTOM_KINDS: readonly TTankKind[] = ["double_bottom", "double_bottom_hopper", "double_bottom_side", "double_bottom_hopper_side", "fore_peak", "aft_peak"];
const hasBottom = (c: TConcernContext) => BOTTOM_KINDS.includes(c.kind);
const always = () => true;

const RULES: TRule[] = [
  {
    id: "coating-edges-welds-piping",
    title: "Coating at edges, welds and piping",
    lookFor: "Breakdown and rust along free edges of stiffeners and brackets, weld seams, scallops, pipe supports and pipe runs; estimate each as a percentage of its area.",
    why: "Coating is thinnest on edges and welds and breaks down there first; piping and its supports are hard to coat and flex.",
    applies: always,
    because: () => "Every tank.",
  },
  {
    id: "coating-anodes-sediment",
    title: "Coating overall, anodes and sediment",
    lookFor: "Breakdown %, rusted area % and hard scale % per area; wastage of each anode and whether anodes are working at all; depth and extent of mud on the bottom and on horizontal members.",
    why: "The coating rating, the anodes to renew and the sediment to remove are recorded for every inspection and drive the next docking's work.",
    applies: always,
    because: () => "Every tank.",
  },
  {
    id: "stiffness-changes",
    title: "Abrupt changes of stiffness",
    lookFor: "Cracks at bracket toes, at the ends of girders and stringers, at scallops and cut-outs, and where a stiffener ends on unsupported plating.",
    why: "Stress gathers where stiff structure meets flexible structure; fatigue cracks start there.",
    applies: always,
    because: () => "Every tank.",
  },
  {
    id: "bell-mouths",
    title: "Plating under bell mouths",
    lookFor: "Pitting, grooving and thinning of the bottom plating under and around suction and filling bell mouths; condition of the striker pads.",
    why: "The flow of ballast water at the bell mouth erodes coating and steel beneath it.",
    applies: hasBottom,
    because: () => "The tank has bottom plating with ballast suctions.",
  },
  {
    id: "midship-brackets",
    title: "Bracket connections near deck and bottom",
    lookFor: "Cracks at the connections of longitudinals to web frames and transverse bulkheads, at the upper and lower brackets; for any crack found, examine the same connection at the frames either side.",
    why: "The midship region carries the highest longitudinal bending; the connections at the deck and bottom flanges work hardest and cracks there tend to repeat at neighbouring frames.",
    applies: (c) => c.position.midship.applies,
    because: (c) => c.position.midship.why,
  },
  {
    id: "engine-room-diagonal-cracks",
    title: "Diagonal cracks in webs and brackets near the engine room",
    lookFor: "Diagonal (shear) cracks in web frames, floors, girders and brackets close to the engine-room forward bulkhead.",
    why: "The change from the stiff engine room to the cargo region and the machinery's vibration concentrate shear in the structure next to that bulkhead.",
    applies: (c) => c.position.nearEngineRoom.applies,
    because: (c) => c.position.nearEngineRoom.why,
  },
  {
    id: "uneven-hold-loading",
    title: "Diagonal cracks between holds loaded unevenly",
    lookFor: "Diagonal cracks in floors, girders and hopper webs next to the transverse bulkheads between cargo holds, in way of the stools.",
    why: "Alternate or uneven hold loading shears the double bottom at the bulkheads between a loaded and an empty hold.",
    applies: (c) => c.vesselType === "bulk_carrier" && hasBottom(c) && c.kind !== "fore_peak" && c.kind !== "aft_peak",
    because: () => "A double-bottom or hopper tank of a bulk carrier, under the cargo holds.",
  },
  {
    id: "waterline-contact",
    title: "Contact damage at the waterline",
    lookFor: "Dents, buckled side longitudinals and cracked web connections on the side shell, from fenders, tugs, quays and floating objects.",
    why: "The side shell at the waterline takes the contact of berthing and of anything floating.",
    applies: (c) => c.atWaterline || (c.kind === "side" || c.kind === "double_bottom_side" || c.kind === "double_bottom_hopper_side" || c.kind === "hopper_side"),
    because: (c) => (c.atWaterline ? "The tank is marked as at the waterline." : "The tank has side shell plating that reaches the waterline."),
  },
  {
    id: "forward-slamming",
    title: "Slamming damage in the forward bottom",
    lookFor: "Set-in or buckled bottom plating between floors, cracked floors and bottom longitudinal connections in the forward bottom.",
    why: "In head seas the forward bottom leaves the water and slams back, loading its plating and floors far beyond their usual loads.",
    applies: (c) => c.position.forwardRegion.applies && hasBottom(c),
    because: (c) => c.position.forwardRegion.why,
  },
  {
    id: "fore-peak-anchor",
    title: "Anchor contact and the collision bulkhead",
    lookFor: "Dents and cracks of the shell near the anchor bolsters and hawse pipes, wear of the chain pipes, and the condition of the collision bulkhead and its stiffening.",
    why: "The anchor and chain strike the forward shell; the collision bulkhead must stay watertight.",
    applies: (c) => c.kind === "fore_peak" || c.position.forwardOfCollisionBulkhead.applies,
    because: (c) => (c.kind === "fore_peak" ? "The tank is the fore peak." : c.position.forwardOfCollisionBulkhead.why),
  },
  {
    id: "heated-boundary",
    title: "Accelerated corrosion on the boundary to a heated tank",
    lookFor: "Coating breakdown, blistering and corrosion on the boundary shared with the heated tank and its stiffeners; gauge thickness where rust is found.",
    why: "Heat from the other side speeds up coating breakdown and corrosion on the ballast side.",
    applies: (c) => Boolean(c.heatedBoundary),
    because: (c) => `Heated boundary: ${c.heatedBoundary}.`,
  },
];

export type TChosenConcern = TConcern & { because: string };

export function areasOfConcern(c: TConcernContext): TChosenConcern[] {
  return RULES.filter((r) => r.applies(c)).map(({ id, title, lookFor, why, because }) => ({ id, title, lookFor, why, because: because(c) }));
}

export const CONCERN_IDS = RULES.map((r) => r.id);
