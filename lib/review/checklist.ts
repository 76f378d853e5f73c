// The clip's to-do list, from what the measurements still need (the engine's `needs` entries):
// each distinct need once, with the measurements waiting on it, and where to go to supply it —
// the frame and the tool with its role. A need with no mark to draw (a setting) has no tool.
import type { MarkRole } from "@/lib/marks/types";
import type { Tool } from "./tools";

export type NeedAction = { frame: number | null; tool: Tool | null; role: MarkRole | null; hint: string };
export type ChecklistItem = NeedAction & { need: string; keys: string[] };
export type ChecklistMoments = { address: number | null; impact: number | null; suggestedImpact: number | null; frameCount: number };

const clampTo = (n: number, m: ChecklistMoments) => Math.min(Math.max(n, 0), Math.max(m.frameCount - 1, 0));

/** Where to go and what to draw for one need. */
export function actionForNeed(need: string, m: ChecklistMoments): NeedAction {
  let r: RegExpMatchArray | null;
  if ((r = need.match(/^the (address|impact|takeaway|top|finish) frame moment/))) {
    const moment = r[1]!;
    const frame = moment === "impact" ? (m.suggestedImpact ?? null) : moment === "address" ? (m.address ?? null) : null;
    const key = moment === "impact" ? "Shift+I" : moment === "address" ? "Shift+A" : null;
    const where = moment === "impact" && m.suggestedImpact !== null ? "the suggested impact" : `the ${moment} frame`;
    return { frame, tool: null, role: null, hint: key ? `Find ${where} and press ${key}` : `Set the ${moment} frame` };
  }
  if ((r = need.match(/^an? (face|shaft|sole) line on frame (\d+)/))) return { frame: Number(r[2]), tool: "line", role: r[1] as MarkRole, hint: `Draw the ${r[1]} line` };
  if (/^a target line/.test(need)) return { frame: null, tool: "line", role: "target", hint: "Draw the target line from the ball toward the hole" };
  if (/^a ground line/.test(need)) return { frame: null, tool: "line", role: "ground", hint: "Draw a ground line" };
  if (/^face lines on 2 frames after address/.test(need) && m.address !== null) return { frame: clampTo(m.address + 1, m), tool: "line", role: "face", hint: "Draw the face on frames after address" };
  if ((r = need.match(/^(ball|clubhead|marker)(?: and ball)? points .*after impact/)) && m.impact !== null) {
    const role = r[1] as MarkRole;
    return { frame: clampTo(m.impact + 1, m), tool: role === "ball" ? "ballTrack" : "point", role, hint: `Click the ${role} on frames after impact` };
  }
  if ((r = need.match(/^(clubhead) points .*up to impact/)) && m.impact !== null) return { frame: clampTo(m.impact - 3, m), tool: "point", role: "clubhead", hint: "Click the clubhead on the frames up to impact" };
  if (/scale mark/.test(need)) return { frame: null, tool: "scale", role: "ball", hint: "Draw a scale across the ball" };
  return { frame: null, tool: null, role: null, hint: "" };
}

/** One item per distinct need, in the order the measurements list them. */
export function checklist(measurements: readonly { key: string; value: number | null; needs?: string[] }[], m: ChecklistMoments): ChecklistItem[] {
  const items = new Map<string, ChecklistItem>();
  for (const row of measurements) {
    if (row.value !== null) continue;
    for (const need of row.needs ?? []) {
      const item = items.get(need) ?? { need, keys: [], ...actionForNeed(need, m) };
      item.keys.push(row.key);
      items.set(need, item);
    }
  }
  return [...items.values()];
}
