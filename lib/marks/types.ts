import type { Vec2 } from "@/lib/geometry/vector";

export const VIEWS = ["overhead", "face-on", "down-the-line"] as const;
export type View = (typeof VIEWS)[number];

export const MARK_KINDS = ["point", "line", "angle", "scale", "plane"] as const;
export type MarkKind = (typeof MARK_KINDS)[number];

export const MARK_ROLES = ["face", "target", "path", "shaft", "sole", "ground", "ball", "clubhead", "marker"] as const;
export type MarkRole = (typeof MARK_ROLES)[number];

/** Number of points each kind carries (docs/measurements.md, "Marks"). */
export const POINTS_PER_KIND: Record<MarkKind, number> = { point: 1, line: 2, angle: 3, scale: 2, plane: 4 };

export type MarkInput = {
  frame: number;
  kind: MarkKind;
  role: MarkRole;
  points: Vec2[];
  lengthMm?: number;
  widthMm?: number;
  heightMm?: number;
};

/** Who placed a mark: a person's click, or the worker's tracking pass (a proposal). */
export const MARK_SOURCES = ["hand", "tracked"] as const;
export type MarkSource = (typeof MARK_SOURCES)[number];

/**
 * One standard deviation of a hand-placed point, px: a click on a frame is good to about a pixel
 * (common practice for manual digitising). Used when a mark states no precision of its own.
 */
export const HAND_CLICK_PRECISION_PX = 1;

export type StoredMark = MarkInput & {
  id: string;
  /** Absent means "hand" (marks stored before tracking existed). */
  source?: MarkSource;
  /** One standard deviation of each point in px; absent means HAND_CLICK_PRECISION_PX. */
  precisionPx?: number | null;
};

export type ClipFrameInfo = { width: number; height: number; frameCount: number; view: View };
