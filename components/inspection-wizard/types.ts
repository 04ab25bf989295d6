import type { TInspectionView } from "@/lib/services/inspections";

/** The inspection as the API sends it (dates arrive as strings). */
export type TView = TInspectionView;
export const partUrl = (inspectionId: string, section: string) => `/api/v1/inspections/${inspectionId}/sections/${section}`;
