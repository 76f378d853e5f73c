"use client";
// Issues the chosen build as the golfer's spec. Build-shop fields left empty come from the build.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

type Reply = { spec: { id: string }; email: { sent: boolean; to: string | null; error: string | null } };

export function IssueSpecForm({ fittingId, builds, golferEmail }: { fittingId: string; builds: { id: string; label: string }[]; golferEmail: string | null }) {
  const router = useRouter();
  const [buildId, setBuildId] = useState(builds.at(-1)?.id ?? "");
  const [notes, setNotes] = useState("");
  const [gripOrientation, setGripOrientation] = useState("");
  const [finishNotes, setFinishNotes] = useState("");
  const [sendEmail, setSendEmail] = useState(Boolean(golferEmail));
  const [result, setResult] = useState<Reply | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="flex flex-col gap-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        try {
          const reply = await apiFetch<Reply>(`/api/fittings/${fittingId}/specs`, { method: "POST", body: { buildId, notes, sendEmail, buildShop: { gripOrientation, finishNotes } } });
          setResult(reply);
          router.refresh();
        } catch (err) {
          setError(err instanceof Error ? err.message : "Not issued");
        } finally {
          setBusy(false);
        }
      }}
    >
      <p className="text-slate-600">A spec is a frozen copy: it is never changed afterwards. Issuing a new one replaces the current spec and keeps it in the history.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="spec-build" className="field-label">Build</label>
          <select id="spec-build" className="field" value={buildId} onChange={(e) => setBuildId(e.target.value)}>
            {builds.map((b) => <option key={b.id} value={b.id}>{b.label}</option>)}
          </select>
        </div>
        <div>
          <label htmlFor="spec-grip" className="field-label">Grip orientation</label>
          <input id="spec-grip" className="field" value={gripOrientation} onChange={(e) => setGripOrientation(e.target.value)} placeholder="e.g. flat side up, square to the face" />
        </div>
        <div>
          <label htmlFor="spec-finish" className="field-label">Finish notes</label>
          <input id="spec-finish" className="field" value={finishNotes} onChange={(e) => setFinishNotes(e.target.value)} />
        </div>
        <div>
          <label htmlFor="spec-notes" className="field-label">Notes for the golfer</label>
          <textarea id="spec-notes" className="field" rows={2} value={notes} onChange={(e) => setNotes(e.target.value)} />
        </div>
      </div>
      <label className="flex min-h-touch items-center gap-2">
        <input type="checkbox" checked={sendEmail} disabled={!golferEmail} onChange={(e) => setSendEmail(e.target.checked)} />
        {golferEmail ? `E-mail it with the PDF to ${golferEmail}` : "No e-mail address on record for the golfer"}
      </label>
      <button type="submit" className="btn-primary self-start" disabled={busy || !buildId}>Issue spec</button>
      {error && <p role="alert" className="field-error">{error}</p>}
      {result && (
        <p role="status">
          Spec issued. <a className="underline" href={`/studio/fittings/${fittingId}/specs/${result.spec.id}`}>Printable page</a> ·{" "}
          <a className="underline" href={`/api/specs/${result.spec.id}/pdf`}>PDF</a>
          {result.email.sent ? ` · e-mailed to ${result.email.to}.` : result.email.error ? ` · ${result.email.error}.` : "."}
        </p>
      )}
    </form>
  );
}
