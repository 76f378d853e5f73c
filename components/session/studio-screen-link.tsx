"use client";

// Makes the read-only studio-screen link for this fitting (a new one replaces the old), to open
// on the second monitor or TV. The link itself is shown once; only its expiry is kept.
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

export function StudioScreenLink({ fittingId }: { fittingId: string }) {
  const [link, setLink] = useState<{ url: string; expiresAt: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const make = async () => {
    setError(null);
    try {
      const made = await apiFetch<{ path: string; expiresAt: string }>(`/api/fittings/${fittingId}/studio-screen`, { method: "POST" });
      setLink({ url: new URL(made.path, window.location.origin).toString(), expiresAt: made.expiresAt });
    } catch (err) {
      setError((err as Error).message);
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-3 text-label">
      <button type="button" className="btn-quiet" onClick={make}>{link ? "Make a new studio-screen link" : "Studio-screen link"}</button>
      {link && (
        <span>
          <a className="underline" href={link.url} target="_blank" rel="noreferrer" data-testid="studio-screen-link">Open the studio screen</a>{" "}
          <span className="text-slate-600">(works for this fitting only, until {new Date(link.expiresAt).toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })} or the fitting is completed; older links stop working)</span>
        </span>
      )}
      {error && <span className="field-error" role="alert">{error}</span>}
    </div>
  );
}
