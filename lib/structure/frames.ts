// Frame ranges: the one place that says whether frames lie inside a vessel or a tank.

export type TFrameSpan = { frameFrom: number; frameTo: number };

export function formatFrames(from: number, to: number): string {
  return from === to ? `Fr. ${from}` : `Fr. ${from}–${to}`;
}

export function spanInside(inner: TFrameSpan, outer: TFrameSpan): boolean {
  return inner.frameFrom >= outer.frameFrom && inner.frameTo <= outer.frameTo;
}

export function spansOverlap(a: TFrameSpan, b: TFrameSpan): boolean {
  return a.frameFrom <= b.frameTo && b.frameFrom <= a.frameTo;
}

/** Frames between a span and a frame: 0 when the frame lies inside the span. */
export function framesApart(span: TFrameSpan, frame: number): number {
  if (frame < span.frameFrom) return span.frameFrom - frame;
  if (frame > span.frameTo) return frame - span.frameTo;
  return 0;
}

/** Why a frame range does not fit a tank, or null when it does. */
export function frameRangeProblem(
  range: { from: number; to: number },
  tank: TFrameSpan & { code: string },
): string | null {
  if (range.from > range.to) return `the aft frame (${range.from}) must not be forward of the forward frame (${range.to})`;
  if (range.from < tank.frameFrom || range.to > tank.frameTo) {
    return `${formatFrames(range.from, range.to)} is outside ${tank.code} (${formatFrames(tank.frameFrom, tank.frameTo)})`;
  }
  return null;
}
