"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

/** Books a fitting for the golfer and opens it. */
export function NewFittingForm({ golferId }: { golferId: string }) {
  const router = useRouter();
  const [when, setWhen] = useState(() => new Date(Date.now() - new Date().getTimezoneOffset() * 60000).toISOString().slice(0, 16));
  const [error, setError] = useState<string | null>(null);
  return (
    <form
      className="mt-4 flex flex-wrap items-end gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        try {
          const fitting = await apiFetch<{ id: string }>("/api/fittings", { method: "POST", body: { golferId, scheduledAt: new Date(when).toISOString() } });
          router.push(`/studio/fittings/${fitting.id}`);
        } catch (err) {
          setError(err instanceof Error ? err.message : "Could not create the fitting");
        }
      }}
    >
      <div>
        <label htmlFor="fitting-when" className="field-label">New fitting at</label>
        <input id="fitting-when" type="datetime-local" className="field" value={when} onChange={(e) => setWhen(e.target.value)} aria-describedby={error ? "fitting-error" : undefined} />
      </div>
      <button type="submit" className="btn-primary">New fitting</button>
      {error && <p id="fitting-error" role="alert" className="field-error w-full">{error}</p>}
    </form>
  );
}
