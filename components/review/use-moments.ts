"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { showMeasurements } from "./measurements-cache";
import type { MeasurementsReply, MomentName, ReviewMoments } from "./types";

type Writes = { inTurn: (work: () => Promise<void>) => void; report: (text: string) => void };

/**
 * The clip's frame moments; setting one shows it at once and saves it in turn with the marks'
 * saves (one queue: the measurements shown are always those of the latest edit).
 */
export function useMoments(clipId: string, initial: ReviewMoments, writes: Writes) {
  const queryClient = useQueryClient();
  const [moments, setMoments] = useState(initial);
  const setMoment = (name: MomentName, frame: number) => {
    const before = moments;
    setMoments({ ...moments, [name]: frame });
    writes.inTurn(async () => {
      try {
        const reply = await apiFetch<Pick<MeasurementsReply, "measurements">>(`/api/clips/${clipId}/moments`, { method: "PUT", body: { [name]: frame } });
        showMeasurements(queryClient, clipId, reply);
      } catch (err) {
        setMoments(before);
        writes.report(`Could not set ${name}: ${err instanceof Error ? err.message : String(err)}`);
      }
    });
  };
  return { moments, setMoment, replaceMoments: setMoments };
}
