"use client";
// Copy a build changing one thing: the usual way to try the next configuration.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { BUILD_FIELDS, fieldValue, isNumericField } from "./build-fields";

export function DuplicateBuild({ buildId, label }: { buildId: string; label: string }) {
  const router = useRouter();
  const [field, setField] = useState("lengthIn");
  const [value, setValue] = useState("");
  const [error, setError] = useState<string | null>(null);
  const info = BUILD_FIELDS.find((f) => f.key === field)!;
  const id = `dup-${buildId}`;
  return (
    <form
      className="flex flex-col gap-2 border-t border-chalk-300 pt-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        const parsed = fieldValue(info, value);
        const shown = info.choices ? info.choices.find((c) => c.value === value)?.label.toLowerCase() ?? "" : `${value}${info.unit ?? ""}`;
        try {
          await apiFetch(`/api/builds/${buildId}/duplicate`, {
            method: "POST",
            body: { label: `${label} · ${info.label.toLowerCase()} ${shown}`.slice(0, 100), change: { [field]: parsed } },
          });
          setValue("");
          router.refresh();
        } catch (err) {
          setError(err instanceof Error ? err.message : "Not copied");
        }
      }}
    >
      <span className="field-label">Copy with one change</span>
      <div className="flex gap-2">
        <select aria-label="What changes" className="field" value={field} onChange={(e) => { setField(e.target.value); setValue(""); }}>
          {BUILD_FIELDS.map((f) => <option key={f.key} value={f.key}>{f.label}</option>)}
        </select>
        {info.choices ? (
          <select id={id} aria-label={`New ${info.label.toLowerCase()}`} className="field w-28" value={value} onChange={(e) => setValue(e.target.value)} aria-describedby={error ? `${id}-error` : undefined}>
            {[{ value: "", label: "Choose" }, ...info.choices.filter((c) => c.value !== "")].map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}
          </select>
        ) : (
          <input id={id} aria-label={`New ${info.label.toLowerCase()}${info.unit ? ` (${info.unit})` : ""}`} className="field w-28" type={isNumericField(info) ? "number" : "text"} step={info.step} value={value} onChange={(e) => setValue(e.target.value)} aria-describedby={error ? `${id}-error` : undefined} />
        )}
      </div>
      <button type="submit" className="btn-quiet">Copy build</button>
      {error && <p id={`${id}-error`} role="alert" className="field-error">{error}</p>}
    </form>
  );
}
