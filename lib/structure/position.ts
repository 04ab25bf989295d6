// Where a tank lies along the ship, derived from the vessel's frames, with the
// reason a person can read beside each answer.
import { formatFrames, framesApart, spansOverlap, type TFrameSpan } from "./frames";

export type TVesselFrames = {
  frameFirst: number;
  frameLast: number;
  midshipFromFrame: number | null;
  midshipToFrame: number | null;
  engineRoomFwdBulkheadFrame: number | null;
  collisionBulkheadFrame: number | null;
};

export type TDerived = { applies: boolean; why: string };
export type TTankPosition = {
  midship: TDerived;
  nearEngineRoom: TDerived;
  forwardRegion: TDerived;
  forwardOfCollisionBulkhead: TDerived;
};

/** A tank whose nearest frame is this close to the engine-room forward bulkhead is "next to" it (our setting). */
export const ENGINE_ROOM_NEAR_FRAMES = 3;
/** The forward region: the foremost fifth of the frame numbering (common practice for slamming; counted in frames). */
export const FORWARD_REGION_FRACTION = 0.2;

export function forwardRegionStartFrame(v: TVesselFrames): number {
  return Math.round(v.frameLast - FORWARD_REGION_FRACTION * (v.frameLast - v.frameFirst));
}

export function deriveTankPosition(v: TVesselFrames, tank: TFrameSpan & { atCollisionBulkhead?: boolean }): TTankPosition {
  const frames = formatFrames(tank.frameFrom, tank.frameTo);

  const midship: TDerived =
    v.midshipFromFrame === null || v.midshipToFrame === null
      ? { applies: false, why: "The vessel's particulars do not give the midship region." }
      : spansOverlap(tank, { frameFrom: v.midshipFromFrame, frameTo: v.midshipToFrame })
        ? { applies: true, why: `${frames} overlaps the midship region (${formatFrames(v.midshipFromFrame, v.midshipToFrame)}).` }
        : { applies: false, why: `${frames} lies outside the midship region (${formatFrames(v.midshipFromFrame, v.midshipToFrame)}).` };

  let nearEngineRoom: TDerived;
  if (v.engineRoomFwdBulkheadFrame === null) {
    nearEngineRoom = { applies: false, why: "The vessel's particulars do not give the engine-room forward bulkhead." };
  } else {
    const apart = framesApart(tank, v.engineRoomFwdBulkheadFrame);
    nearEngineRoom =
      apart <= ENGINE_ROOM_NEAR_FRAMES
        ? { applies: true, why: `${frames} is ${apart === 0 ? "at" : `${apart} frame${apart === 1 ? "" : "s"} from`} the engine-room forward bulkhead (Fr. ${v.engineRoomFwdBulkheadFrame}).` }
        : { applies: false, why: `${frames} is ${apart} frames from the engine-room forward bulkhead (Fr. ${v.engineRoomFwdBulkheadFrame}).` };
  }

  const fwdStart = forwardRegionStartFrame(v);
  const forwardRegion: TDerived =
    tank.frameTo > fwdStart
      ? { applies: true, why: `${frames} reaches into the forward fifth of the ship (forward of Fr. ${fwdStart}).` }
      : { applies: false, why: `${frames} lies aft of the forward fifth of the ship (Fr. ${fwdStart}).` };

  let forwardOfCollisionBulkhead: TDerived;
  if (v.collisionBulkheadFrame !== null && tank.frameFrom >= v.collisionBulkheadFrame) {
    forwardOfCollisionBulkhead = { applies: true, why: `${frames} starts at or forward of the collision bulkhead (Fr. ${v.collisionBulkheadFrame}).` };
  } else if (tank.atCollisionBulkhead) {
    forwardOfCollisionBulkhead = { applies: true, why: "Marked on the tank as at or forward of the collision bulkhead." };
  } else {
    forwardOfCollisionBulkhead = {
      applies: false,
      why: v.collisionBulkheadFrame === null ? "The vessel's particulars do not give the collision bulkhead." : `${frames} lies aft of the collision bulkhead (Fr. ${v.collisionBulkheadFrame}).`,
    };
  }
  return { midship, nearEngineRoom, forwardRegion, forwardOfCollisionBulkhead };
}
