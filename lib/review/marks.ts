// The review screen's document: marks as plain data, exactly as the API stores them.
import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkKind, MarkRole, MarkSource } from "@/lib/marks/types";

export type ReviewMark = {
  id: string;
  frame: number;
  kind: MarkKind;
  role: MarkRole;
  points: Vec2[];
  lengthMm?: number | null;
  widthMm?: number | null;
  heightMm?: number | null;
  authorUserId?: string | null;
  /** Absent on marks from before tracking: those are hand marks. */
  source?: MarkSource;
  /** One standard deviation of each point, px; null or absent = the stated hand-click default. */
  precisionPx?: number | null;
  version: number;
};

/** The fields a command may change on a mark (what PATCH accepts besides the version). */
export type MarkFields = Pick<ReviewMark, "frame" | "role" | "points" | "lengthMm" | "widthMm" | "heightMm">;

export const fieldsOf = (m: MarkFields): MarkFields => ({
  frame: m.frame,
  role: m.role,
  points: m.points,
  lengthMm: m.lengthMm ?? null,
  widthMm: m.widthMm ?? null,
  heightMm: m.heightMm ?? null,
});

/** The body POST takes to create `m` again (undo of a delete). */
export function createBody(m: Omit<ReviewMark, "id" | "version">) {
  const body: Record<string, unknown> = { frame: m.frame, kind: m.kind, role: m.role, points: m.points };
  if (m.lengthMm != null) body.lengthMm = m.lengthMm;
  if (m.widthMm != null) body.widthMm = m.widthMm;
  if (m.heightMm != null) body.heightMm = m.heightMm;
  return body;
}

/** The body PATCH takes to set `fields` on a mark at `version`; nulls are left out. */
export function patchBody(version: number, fields: Partial<MarkFields>) {
  const body: Record<string, unknown> = { version };
  for (const [k, v] of Object.entries(fields)) if (v != null) body[k] = v;
  return body;
}

export const replaceMark = (marks: readonly ReviewMark[], next: ReviewMark): ReviewMark[] => marks.map((m) => (m.id === next.id ? next : m));
export const withoutMark = (marks: readonly ReviewMark[], id: string): ReviewMark[] => marks.filter((m) => m.id !== id);

/** Points of a mark with one handle moved. */
export const moveHandle = (points: readonly Vec2[], index: number, to: Vec2): Vec2[] =>
  points.map((p, i) => (i === index ? ([Math.round(to[0] * 100) / 100, Math.round(to[1] * 100) / 100] as Vec2) : p));

/**
 * A proposal is drawn quieter (hollow, dashed, lower opacity) until the fitter accepts the clip's
 * tracking; a hand mark, or one the fitter moved (the server makes it a hand mark), is solid.
 */
export const isProposal = (m: Pick<ReviewMark, "source">, acceptedAt: string | null | undefined): boolean => m.source === "tracked" && !acceptedAt;

/** The mark as shown while its moved points are saved: moving a proposal makes it the fitter's own. */
export const movedByHand = (m: ReviewMark, fields: Partial<MarkFields>): ReviewMark =>
  fields.points && m.source === "tracked" ? { ...m, ...fields, source: "hand", precisionPx: null } : { ...m, ...fields };

/** The opening of an angle mark (arm, vertex, arm) in degrees, 0–180. */
export function angleDegrees(points: readonly Vec2[]): number | null {
  const [a, v, b] = points;
  if (!a || !v || !b) return null;
  const u: Vec2 = [a[0] - v[0], a[1] - v[1]], w: Vec2 = [b[0] - v[0], b[1] - v[1]];
  if ((u[0] === 0 && u[1] === 0) || (w[0] === 0 && w[1] === 0)) return null;
  return (Math.abs(Math.atan2(u[0] * w[1] - u[1] * w[0], u[0] * w[0] + u[1] * w[1])) * 180) / Math.PI;
}
