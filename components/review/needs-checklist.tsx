"use client";

import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api";
import { METRICS_BY_VIEW } from "@/lib/metrics/keys";
import { checklist, type ChecklistItem, type ChecklistMoments } from "@/lib/review/checklist";
import { measurementsKey } from "./measurements-cache";
import type { MeasurementsReply, ReviewClip } from "./types";

/** What the clip's measurements still need, one line each; a click goes to the frame and picks the tool. */
export function NeedsChecklist({ clip, moments, onGo }: { clip: ReviewClip; moments: ChecklistMoments; onGo: (item: ChecklistItem) => void }) {
  const { data } = useQuery({ queryKey: measurementsKey(clip.id), queryFn: () => apiFetch<MeasurementsReply>(`/api/clips/${clip.id}/measurements`) });
  if (!data) return null;
  const labels = new Map(METRICS_BY_VIEW[clip.view].map((d) => [d.key, d.label]));
  const items = checklist(data.measurements, moments);
  return (
    <section aria-labelledby="checklist-heading" className="border-b border-ink-700 p-4" data-testid="checklist">
      <h2 id="checklist-heading" className="text-label font-medium uppercase text-slate-300">Still to mark</h2>
      {items.length === 0 ? (
        <p className="mt-1 text-label text-slate-300">Every measurement of this view has what it needs.</p>
      ) : (
        <ul className="mt-1 flex flex-col gap-1">
          {items.map((item) => (
            <li key={item.need}>
              <button type="button" disabled={item.frame === null && item.tool === null} onClick={() => onGo(item)}
                className="w-full rounded border border-ink-600 px-2 py-1 text-left text-label text-slate-200 hover:border-chalk disabled:hover:border-ink-600">
                <span className="block text-chalk">{item.hint || item.need}</span>
                <span className="block text-[11px] text-slate-400">
                  {item.frame !== null && <span className="num">frame {item.frame} · </span>}for {item.keys.map((k) => labels.get(k) ?? k).join(", ")}
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
