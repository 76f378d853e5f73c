// Mark tools as small state machines: idle → placing points → done. A finished gesture
// yields a mark draft (plain data); the screen saves it. Ball track is a point tool that
// asks the screen to step one frame after every click.
import type { Vec2 } from "@/lib/geometry/vector";
import { BALL_DIAMETER_MM } from "@/lib/geometry/scale";
import { POINTS_PER_KIND, type MarkInput, type MarkKind, type MarkRole } from "@/lib/marks/types";

export const TOOLS = ["select", "line", "point", "angle", "ballTrack", "scale", "plane"] as const;
export type Tool = (typeof TOOLS)[number];

export const TOOL_LABELS: Record<Tool, string> = {
  select: "Select and pan",
  line: "Line",
  point: "Point",
  angle: "Angle",
  ballTrack: "Ball track",
  scale: "Scale",
  plane: "Ground plane",
};

/** The kind of mark a tool makes; select makes none. */
export const KIND_OF_TOOL: Record<Tool, MarkKind | null> = {
  select: null,
  line: "line",
  point: "point",
  angle: "angle",
  ballTrack: "point",
  scale: "scale",
  plane: "plane",
};

export type ToolOptions = { role: MarkRole; lengthMm: number; widthMm: number; heightMm: number };
export const DEFAULT_TOOL_OPTIONS: Omit<ToolOptions, "role"> = { lengthMm: BALL_DIAMETER_MM, widthMm: 500, heightMm: 500 };

/** A finished gesture: exactly the API's mark input. */
export type MarkDraft = MarkInput;

export type ToolState = { tool: Tool; phase: "idle" } | { tool: Tool; phase: "placing"; frame: number; points: Vec2[] };

export type ToolStep = { state: ToolState; draft: MarkDraft | null; advanceFrame: boolean };

export const idle = (tool: Tool): ToolState => ({ tool, phase: "idle" });

/** Points placed so far (empty when idle). */
export const placedPoints = (s: ToolState): Vec2[] => (s.phase === "placing" ? s.points : []);

const round2 = (v: number) => Math.round(v * 100) / 100;

/** One click of a drawing tool at image point `p` on `frame`. Select ignores clicks here. */
export function press(s: ToolState, p: Vec2, frame: number, options: ToolOptions): ToolStep {
  const kind = KIND_OF_TOOL[s.tool];
  if (!kind) return { state: s, draft: null, advanceFrame: false };
  const point: Vec2 = [round2(p[0]), round2(p[1])];
  // A frame change while placing starts over: every point of a mark lies on one frame.
  const previous = s.phase === "placing" && s.frame === frame ? s.points : [];
  // A second click on the same spot would make a zero-length mark: ignore it.
  if (previous.some((q) => Math.hypot(q[0] - point[0], q[1] - point[1]) < 0.5)) return { state: s, draft: null, advanceFrame: false };
  const points = [...previous, point];
  if (points.length < POINTS_PER_KIND[kind]) return { state: { tool: s.tool, phase: "placing", frame, points }, draft: null, advanceFrame: false };
  const role: MarkRole = s.tool === "ballTrack" ? "ball" : options.role;
  const draft: MarkDraft = { frame, kind, role, points };
  if (kind === "scale") draft.lengthMm = options.lengthMm;
  if (kind === "plane") Object.assign(draft, { widthMm: options.widthMm, heightMm: options.heightMm });
  return { state: idle(s.tool), draft, advanceFrame: s.tool === "ballTrack" };
}

/** Escape: drop the points placed so far. */
export const cancel = (s: ToolState): ToolState => idle(s.tool);

/** A label on the overlay: image point and text. */
export type SideLabel = { at: Vec2; text: string };

/**
 * While a ground plane is drawn (corners in order around the rectangle), the sides it has so far
 * are named: corner 1 → 2 is the width, 2 → 3 the height, each with the length it will be given.
 */
export function planeSideLabels(corners: readonly Vec2[], options: Pick<ToolOptions, "widthMm" | "heightMm">): SideLabel[] {
  const sides = [
    { from: 0, to: 1, text: `width ${options.widthMm} mm` },
    { from: 1, to: 2, text: `height ${options.heightMm} mm` },
  ];
  return sides
    .filter((s) => corners.length > s.to)
    .map((s) => {
      const a = corners[s.from]!, b = corners[s.to]!;
      return { at: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] as Vec2, text: s.text };
    });
}
