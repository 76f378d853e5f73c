"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { showMeasurements } from "./measurements-cache";
import type { MeasurementsReply, MomentName, ReviewMoments } from "./types";

/** The clip's frame moments; setting one saves it and shows the measurements recomputed with it. */
export function useMoments(clipId: string, initial: ReviewMoments, onError: (text: string) => void) {
  const queryClient = useQueryClient();
  const [moments, setMoments] = useState(initial);
  const setMoment = async (name: MomentName, frame: number) => {
    const before = moments;
    setMoments({ ...moments, [name]: frame });
    try {
      const reply = await apiFetch<Pick<MeasurementsReply, "measurements">>(`/api/clips/${clipId}/moments`, { method: "PUT", body: { [name]: frame } });
      showMeasurements(queryClient, clipId, reply);
    } catch (err) {
      setMoments(before);
      onError(`Could not set ${name}: ${err instanceof Error ? err.message : String(err)}`);
    }
  };
  return { moments, setMoment, replaceMoments: setMoments };
}
