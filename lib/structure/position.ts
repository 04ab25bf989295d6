// Where a tank lies along the ship, derived from the vessel's frames, with the
// reason a person can read beside each answer.
import { formatFrames, framesApart, type TFrameSpan } from "./frames";

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

  let midship: TDerived;
  if (v.midshipFromFrame === null || v.midshipToFrame === null) {
    midship = { applies: false, why: "The vessel's particulars do not give the midship region." };
  } else {
    const region = formatFrames(v.midshipFromFrame, v.midshipToFrame);
    // Frames shared with the region, not counting a bulkhead frame the tank only touches.
    const from = Math.max(tank.frameFrom, v.midshipFromFrame);
    const to = Math.min(tank.frameTo, v.midshipToFrame);
    if (to - from < 1) {
      midship = { applies: false, why: `${frames} lies outside the midship region (${region})${to === from ? `, touching it only at Fr. ${from}` : ""}.` };
    } else if (from === tank.frameFrom && to === tank.frameTo) {
      midship = { applies: true, why: `${frames} lies within the midship region (${region}).` };
    } else {
      midship = { applies: true, why: `${frames} lies partly in the midship region (${region}): ${formatFrames(from, to)}.` };
    }
  }

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
