// Sediment: volume = depth × area (common practice), and the cost of removing it.

export function sedimentVolumeM3({ depthMm, areaM2 }: { depthMm: number; areaM2: number }): number {
  return (depthMm / 1000) * areaM2;
}

/** Area of a zone measured as length × breadth, m². */
export const zoneAreaM2 = ({ lengthM, breadthM }: { lengthM: number; breadthM: number }) => lengthM * breadthM;

export function totalVolumeM3(zones: readonly { depthMm: number; areaM2: number }[]): number {
  return zones.reduce((sum, z) => sum + sedimentVolumeM3(z), 0);
}

export type TRate = { amount: number; currency: string; place?: string | null };

export function removalCost(volumeM3: number, rate: TRate): { amount: number; currency: string } {
  return { amount: Math.round(volumeM3 * rate.amount * 100) / 100, currency: rate.currency };
}
