"use client";

import { TOOL_LABELS, TOOLS, type Tool } from "@/lib/review/tools";

// Small line icons of our own, drawn on a 24-unit grid.
const ICONS: Record<Tool, string> = {
  select: "M6 3l12 9-6 1-3 6z",
  line: "M5 19L19 5",
  point: "M12 10a2 2 0 1 0 0 4a2 2 0 1 0 0-4",
  angle: "M5 19h14M5 19L16 6",
  ballTrack: "M5 17a2 2 0 1 0 0 .1M12 12a2 2 0 1 0 0 .1M19 7a2 2 0 1 0 0 .1",
  scale: "M4 12h16M4 8v8M20 8v8",
  plane: "M7 6h10l4 12H3z",
};

type Props = { tool: Tool; available: (t: Tool) => boolean; onTool: (t: Tool) => void };

/** The slim rail of mark tools; the number key of each is in its title. */
export function ToolRail({ tool, available, onTool }: Props) {
  return (
    <nav aria-label="Mark tools" className="flex w-rail flex-col items-center gap-1 border-r border-ink-700 bg-ink-800 py-2">
      {TOOLS.map((t, i) => (
        <button
          key={t}
          type="button"
          aria-label={TOOL_LABELS[t]}
          aria-pressed={tool === t}
          title={`${TOOL_LABELS[t]} (${i + 1})`}
          disabled={!available(t)}
          onClick={() => onTool(t)}
          className={`flex h-11 w-11 items-center justify-center rounded-card disabled:opacity-30 ${
            tool === t ? "bg-signal-dark text-white" : "text-slate-200 hover:bg-ink-700"
          }`}
        >
          <svg viewBox="0 0 24 24" className="h-5 w-5" fill="none" stroke="currentColor" strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" aria-hidden>
            <path d={ICONS[t]} />
          </svg>
        </button>
      ))}
    </nav>
  );
}
