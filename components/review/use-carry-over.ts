"use client";

import { useEffect, useRef } from "react";
import { cameraStill, greyFromRgba } from "@/lib/review/camera-still";
import { carriable, carriedWords, carryDrafts, segmentsOf, wantsCarry } from "@/lib/review/carry";
import type { ReviewMark } from "@/lib/review/marks";
import type { MarkDraft } from "@/lib/review/tools";
import type { ReviewClip } from "./types";

/**
 * A clip's first frame as a grey image. Fetched in CORS mode past the cache (the frame store's copy
 * was loaded without CORS and may not be reused for a readable canvas); the store allows the site's
 * origin (scripts/lib/s3-cors.xml).
 */
async function firstFrameGrey(clipId: string) {
  const res = await fetch(`/api/clips/${clipId}/frames/0`, { cache: "no-store" });
  if (!res.ok) throw new Error(`frame 0: ${res.status}`);
  const img = await createImageBitmap(await res.blob());
  const canvas = document.createElement("canvas");
  canvas.width = img.width;
  canvas.height = img.height;
  const ctx = canvas.getContext("2d", { willReadFrequently: true })!;
  ctx.drawImage(img, 0, 0);
  img.close();
  return greyFromRgba(ctx.getImageData(0, 0, canvas.width, canvas.height).data, canvas.width, canvas.height);
}

type Marks = { loaded: boolean; marks: ReviewMark[]; create: (d: MarkDraft) => void; inform: (text: string) => void };

/**
 * On a clip the fitter has not marked yet, carries the previous putt's reference marks (same view,
 * same fitting) as ordinary editable marks on the opening frame — only when the two clips' first
 * frames show the camera has not moved around those marks. Says what it did either way.
 */
export function useCarryOver(clip: ReviewClip, marks: Marks, frame: number) {
  const tried = useRef(false);
  const { loaded } = marks;
  useEffect(() => {
    const source = clip.place?.carry;
    if (!loaded || tried.current || !source) return;
    tried.current = true;
    const reference = carriable(source.marks, clip.view);
    if (reference.length === 0 || !wantsCarry(marks.marks)) return;
    Promise.all([firstFrameGrey(source.clipId), firstFrameGrey(clip.id)])
      .then(([before, now]) => {
        const verdict = cameraStill(before, now, segmentsOf(reference));
        const what = carriedWords(reference);
        if (!verdict.still) return marks.inform(`Not carried from ${source.label}: the camera seems to have moved (${verdict.reason}). Draw the ${what} again.`);
        for (const draft of carryDrafts(reference, frame)) marks.create(draft);
        marks.inform(`Carried the ${what} from ${source.label}: the camera has not moved (${verdict.reason}). Check and move them if needed.`);
      })
      .catch((err: unknown) => marks.inform(`Could not compare with ${source.label} (${err instanceof Error ? err.message : String(err)}): draw the reference marks by hand.`));
  }, [loaded]); // eslint-disable-line react-hooks/exhaustive-deps -- once, when the marks arrive
}
