"use client";

// One putt in the session list: its state, its key numbers once ready (the tracker's proposals count
// once the fitter accepts them: that confirms the impact frame), and the corrections —
// move to another build, set aside as a mishit (with the reason) or back, delete.
import Link from "next/link";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { NumberText } from "./number-text";
import type { SessionPutt } from "./types";
import { useSessionChange } from "./use-session";

const stateWords: Record<SessionPutt["state"], string> = { awaiting_upload: "awaiting upload", queued: "queued", processing: "processing", ready: "ready", failed: "failed" };

type Props = { fittingId: string; putt: SessionPutt; number: number; builds: { id: string; label: string }[]; canEdit: boolean };

export function PuttRow({ fittingId, putt, number, builds, canEdit }: Props) {
  const [reason, setReason] = useState("");
  const patch = useSessionChange(fittingId, (body: Record<string, unknown>) => apiFetch(`/api/clips/${putt.clipId}`, { method: "PATCH", body }));
  const remove = useSessionChange(fittingId, () => apiFetch(`/api/clips/${putt.clipId}`, { method: "DELETE" }));
  const accept = useSessionChange(fittingId, () => apiFetch(`/api/clips/${putt.clipId}/proposals/accept`, { method: "POST", body: {} }));
  const failure = patch.error ?? remove.error ?? accept.error;
  const measured = putt.numbers.filter((n) => n.value !== null);
  return (
    <li className={`rounded-card border border-chalk-300 p-2 ${putt.mishit ? "bg-chalk-200" : ""}`} data-putt={putt.clipId} data-putt-state={putt.state} data-mishit={putt.mishit !== null}>
      <p className="flex flex-wrap items-baseline justify-between gap-2 text-label">
        <span className="font-medium">Putt {number} <span className="font-normal text-slate-600">· {putt.view}</span></span>
        <span className="clip-state text-slate-600">{stateWords[putt.state]}{putt.state === "processing" && <span className="num"> {putt.progress}%</span>}</span>
      </p>
      {putt.mishit && <p className="text-label text-slate-700" data-testid="mishit-reason">Set aside: {putt.mishit.reason}</p>}
      {putt.state === "failed" && <p className="field-error">{putt.failureReason}</p>}
      {putt.state === "ready" && (
        measured.length === 0 ? (
          <p className="flex flex-wrap items-center gap-2 text-label text-slate-600">
            {putt.tracking === "pending" && <span>Tracking…</span>}
            {putt.tracking === "proposed" && canEdit && (
              <button type="button" className="btn-quiet min-h-0 py-1" onClick={() => accept.mutate(undefined)} disabled={accept.isPending}>Use the tracked marks</button>
            )}
            <span>or <Link className="underline" href={`/studio/clips/${putt.clipId}`}>review and mark it</Link> for numbers.</span>
          </p>
        ) : (
          <dl className="mt-1 grid grid-cols-2 gap-x-3 text-label">
            {measured.map((n) => (
              <div key={n.key} className="contents">
                <dt className="text-slate-600">{n.label}</dt>
                <dd data-number={n.key}><NumberText n={n} /></dd>
              </div>
            ))}
          </dl>
        )
      )}
      {canEdit && (
        <details className="mt-1 text-label">
          <summary className="cursor-pointer text-slate-600">Correct this putt</summary>
          <div className="mt-2 flex flex-col gap-2">
            <label className="flex items-center gap-2">
              <span>Move to</span>
              <select className="field py-1" value="" aria-label={`Move putt ${number} to build`}
                onChange={(e) => e.target.value && patch.mutate({ buildId: e.target.value })}>
                <option value="">choose a build…</option>
                {builds.filter((b) => b.id !== putt.buildId).map((b) => <option key={b.id} value={b.id}>{b.label}</option>)}
              </select>
            </label>
            {putt.mishit ? (
              <button type="button" className="btn-quiet self-start" onClick={() => patch.mutate({ mishit: null })}>Count it again</button>
            ) : (
              <form className="flex items-end gap-2" onSubmit={(e) => { e.preventDefault(); patch.mutate({ mishit: { reason } }); }}>
                <label className="flex grow flex-col">
                  <span>Why set aside</span>
                  <input className="field py-1" value={reason} onChange={(e) => setReason(e.target.value)} required maxLength={200} placeholder="mishit off the toe" />
                </label>
                <button type="submit" className="btn-quiet">Set aside</button>
              </form>
            )}
            <button type="button" className="btn-quiet self-start text-signal-dark"
              onClick={() => window.confirm(`Delete putt ${number} (${putt.view}) and its files? This cannot be undone.`) && remove.mutate(undefined)}>
              Delete putt
            </button>
            {failure && <p className="field-error" role="alert">{failure.message}</p>}
          </div>
        </details>
      )}
    </li>
  );
}
