"use client";

// The fitting page's session mode: builds in order, one recording (a click or the keys 1–9 switch
// it), every putt under its build as it arrives, each build's running summary. Updates by itself.
import { useEffect } from "react";
import { apiFetch } from "@/lib/client/api";
import { SessionBuildCard } from "./session-build";
import { useSession, useSessionChange } from "./use-session";

const typing = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName));

export function SessionPanel({ fittingId, canEdit }: { fittingId: string; canEdit: boolean }) {
  const { data, error } = useSession(fittingId);
  const record = useSessionChange(fittingId, (buildId: string | null) =>
    apiFetch(`/api/fittings/${fittingId}/recording`, { method: "PUT", body: { buildId } }),
  );
  const builds = data?.builds;
  const switchTo = record.mutate;

  useEffect(() => {
    if (!canEdit || !builds) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.ctrlKey || e.metaKey || e.altKey || typing(e.target)) return;
      const n = Number(e.key);
      if (Number.isInteger(n) && n >= 1 && n <= 9 && builds[n - 1]) {
        e.preventDefault();
        switchTo(builds[n - 1]!.id);
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [builds, canEdit, switchTo]);

  if (error) return <p className="field-error" role="alert">{error.message}</p>;
  if (!data) return <p className="text-slate-600">Loading the session…</p>;
  if (data.builds.length === 0) return <p className="text-slate-600">Add a build to start recording putts.</p>;
  const recording = data.builds.find((b) => b.recording);
  return (
    <div className="flex flex-col gap-3" data-testid="session">
      <p className="text-label text-slate-600" aria-live="polite">
        {recording ? <>New putts from the capture computer go to <strong className="text-ink" data-testid="recording-label">{recording.label}</strong>.</> : "No build is recording: new putts from the capture computer wait."}
        {canEdit && " Press 1–9 to switch the recording build."}
      </p>
      {record.error && <p className="field-error" role="alert">{record.error.message}</p>}
      <div className="flex gap-4 overflow-x-auto pb-2" role="list" aria-label="Session builds">
        {data.builds.map((b, i) => (
          <SessionBuildCard
            key={b.id} fittingId={fittingId} build={b} index={i} canEdit={canEdit}
            builds={data.builds.map((x) => ({ id: x.id, label: x.label }))}
            leading={data.leading?.buildId === b.id}
            onRecord={() => switchTo(b.recording ? null : b.id)}
          />
        ))}
      </div>
    </div>
  );
}
