"use client";
// The review screen's copy of a clip's measurements: read by the readouts, replaced by every save's answer.
import type { QueryClient } from "@tanstack/react-query";
import type { MeasurementsReply } from "./types";

export const measurementsKey = (clipId: string) => ["measurements", clipId] as const;

export function showMeasurements(queryClient: QueryClient, clipId: string, reply: Pick<MeasurementsReply, "measurements">) {
  queryClient.setQueryData<MeasurementsReply>(measurementsKey(clipId), { measurements: reply.measurements });
}
