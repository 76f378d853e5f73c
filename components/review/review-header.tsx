"use client";

import Link from "next/link";
import type { ReactNode } from "react";
import type { PuttRef } from "@/lib/review/putts";
import type { ReviewClip } from "./types";

const VIEW_NAME: Record<ReviewClip["view"], string> = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down-the-line" };
const quiet = "rounded border border-ink-600 px-3 py-1 text-label disabled:opacity-40";
const puttText = (p: PuttRef) => `putt ${p.putt}, ${p.buildLabel}`;

/** Whose putt this is and the way out: back to the fitting, previous and next putt of this view. */
export function ReviewHeader({ clip, onPutt, children }: { clip: ReviewClip; onPutt: (to: PuttRef) => void; children: ReactNode }) {
  const place = clip.place;
  return (
    <header className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-ink-700 px-4 py-2">
      <Link href={place ? `/studio/fittings/${place.fittingId}` : "/studio"} className="text-label text-slate-300 underline-offset-2 hover:underline">
        ← {place ? "Fitting" : "Studio"}
      </Link>
      <h1 className="text-body font-semibold" data-testid="review-title">
        {place ? (
          <>
            {place.golferName} · {place.buildLabel}{place.putt !== null && ` · putt ${place.putt}`} · {VIEW_NAME[clip.view]}
          </>
        ) : (
          `${VIEW_NAME[clip.view]} clip`
        )}
      </h1>
      {place && (
        <nav aria-label="Putts" className="flex items-center gap-1">
          <button type="button" className={quiet} disabled={!place.previous} title={place.previous ? `${puttText(place.previous)} ([)` : "No earlier putt of this view"}
            onClick={() => place.previous && onPutt(place.previous)}>‹ Previous putt</button>
          <button type="button" className={quiet} disabled={!place.next} title={place.next ? `${puttText(place.next)} (])` : "No later putt of this view"}
            onClick={() => place.next && onPutt(place.next)}>Next putt ›</button>
        </nav>
      )}
      {children}
    </header>
  );
}
