"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";
import { InviteForm } from "./invite-form";

type Coach = { userId: string; name: string; email: string };
type CoachList = { coaches: Coach[]; available: Coach[] };

/** Staff share a golfer with coaches one by one, withdraw at once, or invite a new coach. */
export function CoachAccess({ golferId, golferEmail, golferHasAccount }: { golferId: string; golferEmail: string | null; golferHasAccount: boolean }) {
  const key = ["golfer-coaches", golferId];
  const client = useQueryClient();
  const { data } = useQuery({ queryKey: key, queryFn: () => apiFetch<CoachList>(`/api/golfers/${golferId}/coaches`) });
  const [error, setError] = useState<string | null>(null);

  async function change(method: "POST" | "DELETE", coachUserId: string) {
    setError(null);
    try {
      if (method === "POST") await apiFetch(`/api/golfers/${golferId}/coaches`, { method, body: { coachUserId } });
      else await apiFetch(`/api/golfers/${golferId}/coaches/${coachUserId}`, { method });
      await client.invalidateQueries({ queryKey: key });
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "That did not work.");
    }
  }

  return (
    <section className="card flex flex-col gap-4" aria-labelledby="sharing-heading">
      <h2 id="sharing-heading" className="field-label">Phone access and coaches</h2>
      {!golferHasAccount && <InviteForm golferId={golferId} role="golfer" defaultEmail={golferEmail ?? undefined} />}
      <ul className="divide-y divide-chalk-200" aria-label="Coaches with this golfer">
        {data?.coaches.length === 0 && <li className="py-2 text-slate-600">Not shared with any coach.</li>}
        {data?.coaches.map((c) => (
          <li key={c.userId} className="flex min-h-touch items-center justify-between gap-3">
            <span>{c.name} <span className="text-label text-slate-600">{c.email}</span></span>
            <button type="button" className="btn-quiet" onClick={() => change("DELETE", c.userId)}>Withdraw</button>
          </li>
        ))}
      </ul>
      {data && data.available.length > 0 && (
        <form className="flex flex-wrap items-end gap-2" onSubmit={(e) => { e.preventDefault(); const v = new FormData(e.currentTarget).get("coach"); if (v) void change("POST", String(v)); }}>
          <div className="grow">
            <label htmlFor="share-coach" className="field-label">Share with a coach</label>
            <select id="share-coach" name="coach" className="field min-h-touch">
              {data.available.map((c) => <option key={c.userId} value={c.userId}>{c.name}</option>)}
            </select>
          </div>
          <button type="submit" className="btn-quiet">Share</button>
        </form>
      )}
      {error && <p role="alert" className="field-error">{error}</p>}
      <details>
        <summary className="min-h-touch cursor-pointer py-2 text-slate-700">Invite a new coach</summary>
        <InviteForm golferId={golferId} role="coach" onSent={() => void client.invalidateQueries({ queryKey: key })} />
      </details>
    </section>
  );
}
