"use client";
// The fitting's status, set by hand when needed: planned, in progress (the first clip sets it),
// spec issued (issuing the spec sets it).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

export const FITTING_STATUS_WORDS = { planned: "planned", in_progress: "in progress", completed: "spec issued" } as const;
type Status = keyof typeof FITTING_STATUS_WORDS;

export function FittingStatus({ fittingId, status, canEdit }: { fittingId: string; status: Status; canEdit: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  if (!canEdit) return <span className="text-label text-slate-600" data-testid="fitting-status">{FITTING_STATUS_WORDS[status]}</span>;
  return (
    <label className="flex items-center gap-2 text-label text-slate-600">
      Status
      <select className="field w-40 py-1" value={status} data-testid="fitting-status"
        onChange={async (e) => {
          setError(null);
          try {
            await apiFetch(`/api/fittings/${fittingId}`, { method: "PATCH", body: { status: e.target.value } });
            router.refresh();
          } catch (err) {
            setError(err instanceof Error ? err.message : String(err));
          }
        }}>
        {(Object.keys(FITTING_STATUS_WORDS) as Status[]).map((s) => <option key={s} value={s}>{FITTING_STATUS_WORDS[s]}</option>)}
      </select>
      {error && <span className="field-error" role="alert">{error}</span>}
    </label>
  );
}
