import type { View } from "@/lib/marks/types";

export type CompareBuild = { id: string; label: string; position: number; isBaseline: boolean };
export type CompareClip = { id: string; buildId: string; view: View; createdAt: Date | string; strokeId?: string | null };
export type CompareMeasurement = { clipId: string; key: string; value: number | null; unit: string; uncertainty?: number | null };
export type StudioWindows = Record<string, { min: number; max: number }>;
