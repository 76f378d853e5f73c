"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";

type Stroke = { id: string; position: number };
const NONE = "";
const NEW = "new";

/** Which stroke the next drop goes into: none, a new one, or an existing one (one clip per view). */
export function useStrokeChoice(buildId: string) {
  const queryClient = useQueryClient();
  const [value, setValue] = useState(NONE);
  const [error, setError] = useState<string | null>(null);
  const strokes = useQuery({
    queryKey: ["strokes", buildId],
    enabled: Boolean(buildId),
    queryFn: () => apiFetch<{ strokes: Stroke[] }>(`/api/builds/${buildId}/strokes`),
  });
  /** The stroke id for a drop of `fileCount` files: null for none, undefined when refused. */
  async function resolve(fileCount: number): Promise<string | null | undefined> {
    setError(null);
    if (value === NONE) return null;
    if (fileCount > 1) {
      setError("A stroke takes one clip per view: drop one file at a time.");
      return undefined;
    }
    if (value !== NEW) return value;
    const made = await apiFetch<Stroke>(`/api/builds/${buildId}/strokes`, { method: "POST" });
    await queryClient.invalidateQueries({ queryKey: ["strokes", buildId] });
    setValue(made.id);
    return made.id;
  }
  return { value, setValue, error, strokes: strokes.data?.strokes ?? [], resolve };
}

export function StrokePicker({ choice }: { choice: ReturnType<typeof useStrokeChoice> }) {
  return (
    <label className="flex flex-col">
      <span className="field-label">Stroke (views of one putt, lined up at impact)</span>
      <select className="field" value={choice.value} onChange={(e) => choice.setValue(e.target.value)} aria-describedby={choice.error ? "stroke-error" : undefined}>
        <option value={NONE}>No stroke: a single view</option>
        <option value={NEW}>New stroke</option>
        {choice.strokes.map((s) => <option key={s.id} value={s.id}>Stroke {s.position}</option>)}
      </select>
      {choice.error && <span id="stroke-error" role="alert" className="field-error">{choice.error}</span>}
    </label>
  );
}
