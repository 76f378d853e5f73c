// The review screen's keyboard, as data: one table drives both the handler and the help overlay.
import type { Tool } from "./tools";

export type KeyCommand =
  | { type: "step"; by: number }
  | { type: "first" }
  | { type: "last" }
  | { type: "jump"; moment: "address" | "impact" }
  | { type: "setMoment"; moment: "address" | "impact" }
  | { type: "zoom"; by: "in" | "out" | "fit" }
  | { type: "undo" }
  | { type: "redo" }
  | { type: "delete" }
  | { type: "cancel" }
  | { type: "tool"; tool: Tool }
  | { type: "acceptProposals" }
  | { type: "putt"; by: -1 | 1 }
  | { type: "togglePlay" }
  | { type: "help" };

export type KeyPress = { key: string; shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean };

const TOOL_KEYS: Record<string, Tool> = { "1": "select", "2": "line", "3": "point", "4": "angle", "5": "ballTrack", "6": "scale", "7": "plane" };

/** The command a key press means on the review screen, or null when it means nothing here. */
export function commandForKey(e: KeyPress): KeyCommand | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  if (mod) {
    if (key === "z") return e.shiftKey ? { type: "redo" } : { type: "undo" };
    if (key === "y") return { type: "redo" };
    return null;
  }
  if (e.altKey) return null;
  switch (key) {
    case "ArrowRight": return { type: "step", by: e.shiftKey ? 10 : 1 };
    case "ArrowLeft": return { type: "step", by: e.shiftKey ? -10 : -1 };
    case "Home": return { type: "first" };
    case "End": return { type: "last" };
    case "a": return e.shiftKey ? { type: "setMoment", moment: "address" } : { type: "jump", moment: "address" };
    case "i": return e.shiftKey ? { type: "setMoment", moment: "impact" } : { type: "jump", moment: "impact" };
    case "+": case "=": return { type: "zoom", by: "in" };
    case "-": case "_": return { type: "zoom", by: "out" };
    case "0": return { type: "zoom", by: "fit" };
    case "Delete": case "Backspace": return { type: "delete" };
    case "Escape": return { type: "cancel" };
    case "t": return { type: "acceptProposals" };
    case "[": case "PageUp": return { type: "putt", by: -1 };
    case "]": case "PageDown": return { type: "putt", by: 1 };
    case "p": return { type: "togglePlay" };
    case "?": return { type: "help" };
  }
  const tool = TOOL_KEYS[key];
  return tool && !e.shiftKey ? { type: "tool", tool } : null;
}

/** Every key the screen knows, for the help overlay. */
export const KEY_HELP: readonly { keys: string; does: string }[] = [
  { keys: "→ / ←", does: "Next / previous frame" },
  { keys: "Shift + → / ←", does: "Ten frames forward / back" },
  { keys: "Home / End", does: "First / last frame" },
  { keys: "Space (tap) or P", does: "Play / pause the range (address → finish unless changed)" },
  { keys: "[ / ] (Page Up / Down)", does: "Previous / next putt of this view, across builds" },
  { keys: "A / I", does: "Jump to address / impact" },
  { keys: "Shift + A / Shift + I", does: "Set address / impact to this frame" },
  { keys: "+ / − / 0", does: "Zoom in / out / fit the frame" },
  { keys: "Wheel, pinch", does: "Zoom about the pointer" },
  { keys: "Space + drag", does: "Pan (or drag empty space with Select)" },
  { keys: "1 … 7", does: "Select, line, point, angle, ball track, scale, ground plane" },
  { keys: "Delete / Backspace", does: "Delete the selected mark" },
  { keys: "T", does: "Accept the tracked marks and the tracker's address and impact" },
  { keys: "Esc", does: "Drop the points placed so far, or clear the selection" },
  { keys: "Ctrl/⌘ + Z", does: "Undo" },
  { keys: "Shift + Ctrl/⌘ + Z, Ctrl + Y", does: "Redo" },
  { keys: "?", does: "Show or hide this list" },
];
