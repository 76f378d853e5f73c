"use client";
// Download all of a golfer's data, or erase it for good (with the cautions said plainly).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

export function GolferDataControls({ golferId, golferName, canErase, afterErase }: { golferId: string; golferName: string; canErase: boolean; afterErase: string }) {
  const router = useRouter();
  const [confirm, setConfirm] = useState("");
  const [error, setError] = useState<string | null>(null);
  return (
    <section className="card flex flex-col gap-3" aria-labelledby="data-heading">
      <h2 id="data-heading" className="field-label">Data of {golferName}</h2>
      <p className="text-slate-600">A download holds everything stored: details, intake, fittings, builds, measurements, comments, specs, and links to the clips that work for 15 minutes.</p>
      <a className="btn-quiet self-start" href={`/api/golfers/${golferId}/export`} download>Download all data (JSON)</a>
      {canErase && (
        <form
          className="flex flex-col gap-2 border-t border-chalk-300 pt-3"
          onSubmit={async (e) => {
            e.preventDefault();
            setError(null);
            try {
              await apiFetch(`/api/golfers/${golferId}`, { method: "DELETE", body: { confirm } });
              router.push(afterErase);
              router.refresh();
            } catch (err) {
              setError(err instanceof Error ? err.message : "Not deleted");
            }
          }}
        >
          <p className="text-slate-700">
            Deleting removes the golfer, every fitting, clip (the video files too), mark, measurement, comment and spec, and the golfer&apos;s sign-in.
            <strong> It cannot be undone.</strong> Download the data first if it may be needed; local privacy law may also ask you to keep some records.
          </p>
          <label htmlFor="erase-confirm" className="field-label">Type DELETE to confirm</label>
          <input id="erase-confirm" className="field max-w-xs" value={confirm} onChange={(e) => setConfirm(e.target.value)} aria-describedby={error ? "erase-error" : undefined} />
          <button type="submit" className="btn-quiet self-start border-signal-dark text-signal-dark" disabled={confirm !== "DELETE"}>Delete all data</button>
          {error && <p id="erase-error" role="alert" className="field-error">{error}</p>}
        </form>
      )}
    </section>
  );
}
