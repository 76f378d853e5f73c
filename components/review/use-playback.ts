"use client";

import { useEffect, useEffectEvent, useRef, useState } from "react";
import { defaultRange, frameAt, startFrame, type PlayRange } from "@/lib/review/playback";
import type { ReviewMoments } from "./types";

/**
 * Playback of a range of frames at a fraction of real time (the capture rate's); the frame cursor
 * moves with it, so the marks of each frame are drawn as it passes. The range follows address →
 * finish until the fitter sets one by hand.
 */
export function usePlayback(o: { captureFps: number; frameCount: number; moments: ReviewMoments; frame: number; goTo: (n: number) => void }) {
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1 / 8);
  const [loop, setLoop] = useState(true);
  const [chosen, setChosen] = useState<PlayRange | null>(null);
  const range = chosen ?? defaultRange(o.moments, o.frameCount);
  const cursor = useRef(o.frame);
  cursor.current = o.frame;
  const show = useEffectEvent((n: number) => o.goTo(n));

  useEffect(() => {
    if (!playing) return;
    const p = { ...range, captureFps: o.captureFps, speed, loop };
    const start = startFrame(range, cursor.current);
    const t0 = performance.now();
    let raf = requestAnimationFrame(function tick(now) {
      const { frame, ended } = frameAt(p, start, now - t0);
      if (frame !== cursor.current) show(frame);
      if (ended) setPlaying(false);
      else raf = requestAnimationFrame(tick);
    });
    return () => cancelAnimationFrame(raf);
  }, [playing, speed, loop, range.from, range.to, o.captureFps]); // eslint-disable-line react-hooks/exhaustive-deps -- range is rebuilt each render; its ends are the dependency

  return {
    playing,
    speed,
    loop,
    range,
    rangeByHand: chosen !== null,
    toggle: () => setPlaying((p) => !p),
    pause: () => setPlaying(false),
    setSpeed,
    setLoop,
    setRange: (r: PlayRange | null) => setChosen(r && r.to > r.from ? r : null),
  };
}
