"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { measurementsKey, showMeasurements } from "./measurements-cache";
import type { MeasurementsReply, ReviewClip, ReviewMoments, ReviewTracking } from "./types";

// The clip as GET /api/clips/{id} answers it: the parts tracking changes.
type ClipReply = { moments: ReviewMoments; suggestedImpactFrame: number | null; trackingEnabled?: boolean; tracking?: ReviewTracking | null };

const POLL_MS = 1500;
const POLL_LIMIT_MS = 90_000;

type Effects = { reloadMarks: () => void; replaceMoments: (m: ReviewMoments) => void; report: (text: string) => void };

/**
 * The clip's tracking: the per-clip switch, a re-run, and accepting the proposals (the tracker's
 * address and impact; proposals turn solid). Each change refreshes the marks, the moments and the
 * measurements from the server.
 */
export function useTracking(clip: ReviewClip, effects: Effects) {
  const queryClient = useQueryClient();
  const [enabled, setEnabled] = useState(clip.trackingEnabled ?? true);
  const [tracking, setTracking] = useState<ReviewTracking | null>(clip.tracking ?? null);
  const [suggestedImpact, setSuggestedImpact] = useState(clip.suggestedImpactFrame);
  const [busy, setBusy] = useState<null | "switch" | "run" | "accept">(null);
  const live = useRef(true);
  useEffect(() => () => void (live.current = false), []);
  const base = `/api/clips/${clip.id}`;

  const refresh = async () => {
    const c = await apiFetch<ClipReply>(base);
    if (!live.current) return c;
    effects.replaceMoments(c.moments);
    setSuggestedImpact(c.suggestedImpactFrame);
    if (c.trackingEnabled !== undefined) setEnabled(c.trackingEnabled);
    setTracking(c.tracking ?? null);
    effects.reloadMarks();
    await queryClient.invalidateQueries({ queryKey: measurementsKey(clip.id) });
    return c;
  };

  const run = async (what: NonNullable<typeof busy>, work: () => Promise<void>, failure: string) => {
    setBusy(what);
    try {
      await work();
    } catch (err) {
      effects.report(`${failure}: ${err instanceof Error ? err.message : String(err)}`);
    } finally {
      if (live.current) setBusy(null);
    }
  };

  const toggle = (on: boolean) =>
    run("switch", async () => {
      const reply = await apiFetch<{ measurements?: MeasurementsReply["measurements"] }>(base, { method: "PATCH", body: { trackingEnabled: on } });
      setEnabled(on);
      if (reply?.measurements) showMeasurements(queryClient, clip.id, { measurements: reply.measurements });
      await refresh();
    }, on ? "Could not turn tracking on" : "Could not turn tracking off");

  // The job runs in the worker: wait for a new summary (or give up quietly after a while).
  const rerun = () =>
    run("run", async () => {
      const before = JSON.stringify(tracking);
      await apiFetch(`${base}/tracking`, { method: "POST" });
      const until = Date.now() + POLL_LIMIT_MS;
      while (live.current && Date.now() < until) {
        await new Promise((r) => setTimeout(r, POLL_MS));
        const c = await refresh();
        if (JSON.stringify(c.tracking ?? null) !== before) return;
      }
    }, "Could not run tracking again");

  const accept = () =>
    run("accept", async () => {
      await apiFetch(`${base}/proposals/accept`, { method: "POST", body: {} });
      await refresh();
    }, "Could not accept the tracked marks");

  return { enabled, tracking, suggestedImpact, busy, toggle, rerun, accept };
}
