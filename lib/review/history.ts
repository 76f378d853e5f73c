// Undo history of plain mark data. Each command records before/after; undo and redo hand
// back the command to apply (the screen re-saves it through the API). Re-creating a mark
// gives it a new id, so `renameMark` keeps older commands pointing at the living mark.
import type { MarkFields, ReviewMark } from "./marks";

export type Command =
  | { type: "create"; mark: ReviewMark }
  | { type: "delete"; mark: ReviewMark }
  | { type: "update"; id: string; before: MarkFields; after: MarkFields };

export type History = { past: Command[]; future: Command[] };

export const emptyHistory = (): History => ({ past: [], future: [] });
export const LIMIT = 200;

/** A new command clears what could be redone. */
export const record = (h: History, c: Command): History => ({ past: [...h.past, c].slice(-LIMIT), future: [] });

export const canUndo = (h: History) => h.past.length > 0;
export const canRedo = (h: History) => h.future.length > 0;

/** The command that undoes the last one, and the history after it; null when there is nothing. */
export function undo(h: History): { history: History; apply: Command; undone: Command } | null {
  const last = h.past.at(-1);
  if (!last) return null;
  return { history: { past: h.past.slice(0, -1), future: [...h.future, last] }, apply: inverse(last), undone: last };
}

export function redo(h: History): { history: History; apply: Command; redone: Command } | null {
  const next = h.future.at(-1);
  if (!next) return null;
  return { history: { past: [...h.past, next], future: h.future.slice(0, -1) }, apply: next, redone: next };
}

export function inverse(c: Command): Command {
  if (c.type === "create") return { type: "delete", mark: c.mark };
  if (c.type === "delete") return { type: "create", mark: c.mark };
  return { type: "update", id: c.id, before: c.after, after: c.before };
}

const renameIn = (c: Command, from: string, to: string): Command => {
  if (c.type === "update") return c.id === from ? { ...c, id: to } : c;
  return c.mark.id === from ? { ...c, mark: { ...c.mark, id: to } } : c;
};

/** After a mark is created again under a new id, every command about it follows. */
export function renameMark(h: History, from: string, to: string): History {
  return { past: h.past.map((c) => renameIn(c, from, to)), future: h.future.map((c) => renameIn(c, from, to)) };
}
