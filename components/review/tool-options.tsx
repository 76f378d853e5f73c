"use client";

import type { MarkRole } from "@/lib/marks/types";
import type { Tool, ToolOptions } from "@/lib/review/tools";
import { ROLE_LOOK } from "./roles-look";

type Props = {
  tool: Tool;
  roles: readonly MarkRole[];
  role: MarkRole | null;
  onRole: (r: MarkRole) => void;
  options: ToolOptions;
  onOptions: (o: ToolOptions) => void;
  placed: number;
  needed: number;
  onDelete: (() => void) | null;
};

const mmField = "w-20 rounded border border-ink-600 bg-ink px-2 py-1 text-chalk num";

/** The role picker (only roles that fit the view and the kind) and the tool's known lengths. */
export function ToolOptionsBar({ tool, roles, role, onRole, options, onOptions, placed, needed, onDelete }: Props) {
  const num = (key: "lengthMm" | "widthMm" | "heightMm", label: string) => (
    <label className="flex items-center gap-2 text-label text-slate-300">
      {label}
      <input type="number" min={1} step="0.01" className={mmField} value={options[key]}
        onChange={(e) => Number(e.target.value) > 0 && onOptions({ ...options, [key]: Number(e.target.value) })} />
    </label>
  );
  return (
    <div className="flex min-h-touch flex-wrap items-center gap-4 border-b border-ink-700 bg-ink-800 px-3 py-1.5">
      {role && roles.length > 0 && (
        <label className="flex items-center gap-2 text-label text-slate-300">
          Role
          <select className="rounded border border-ink-600 bg-ink px-2 py-1 text-chalk" value={role} disabled={tool === "ballTrack"}
            onChange={(e) => {
              onRole(e.target.value as MarkRole);
              e.target.blur(); // back to the frame keys
            }}>
            {roles.map((r) => <option key={r} value={r}>{ROLE_LOOK[r].label} ({ROLE_LOOK[r].letter})</option>)}
          </select>
          <span aria-hidden className="inline-block h-3 w-3 rounded-full" style={{ background: ROLE_LOOK[role].colour }} />
        </label>
      )}
      {tool === "scale" && num("lengthMm", "Known length (mm)")}
      {tool === "plane" && (<>
        {num("widthMm", "Width (mm), corner 1 → 2")}{num("heightMm", "Height (mm), corner 2 → 3")}
        <span className="text-label text-slate-300">Click the corners in order around the rectangle, not across it</span>
      </>)}
      {needed > 1 && <span className="text-label text-slate-300">Point {Math.min(placed + 1, needed)} of {needed}</span>}
      {tool === "select" && !onDelete && <span className="text-label text-slate-300">Click a mark to select it; drag its handles. Drag empty space to pan.</span>}
      {tool === "ballTrack" && <span className="text-label text-slate-300">Click the ball centre: each click steps one frame</span>}
      {onDelete && <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label text-chalk hover:border-chalk" onClick={onDelete}>Delete mark</button>}
    </div>
  );
}
