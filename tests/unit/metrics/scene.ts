// Builds synthetic overhead scenes with known angles, for hand-worked and property tests.
import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkInput, StoredMark } from "@/lib/marks/types";
import type { ClipContext } from "@/lib/metrics/types";

export const IMPACT = 300;
export const ADDRESS = 40;

export type OverheadScene = {
  aimDeg: number;
  faceDeg: number;
  pathDeg: number;
  startDeg: number;
  /** face rotation per frame before impact, degrees */
  rotationPerFrameDeg: number;
  twistDeg: number;
  /** ball travel per frame in local px (1 local px = 1 mm through the scale mark) */
  ballStepPx: number;
};

const rad = (deg: number) => (deg * Math.PI) / 180;
/** Local frame: ball at the origin, target straight up the image (−y), golfer's right = +x. */
const direction = (deg: number): Vec2 => [Math.sin(rad(deg)), -Math.cos(rad(deg))];
const along = (from: Vec2, d: Vec2, k: number): Vec2 => [from[0] + k * d[0], from[1] + k * d[1]];

function faceLine(frame: number, deg: number): MarkInput {
  const f: Vec2 = [Math.cos(rad(deg)), Math.sin(rad(deg))]; // ⟂ to the face normal direction(deg)
  const centre: Vec2 = [0, 25];
  return { frame, kind: "line", role: "face", points: [along(centre, f, -40), along(centre, f, 40)] };
}

/** Marks of the scene after mapping every point through `place` (local → image). */
export function overheadMarks(s: OverheadScene, place: (p: Vec2) => Vec2 = (p) => p, scaleLengthMm = 42.67): StoredMark[] {
  const marks: MarkInput[] = [
    { frame: ADDRESS, kind: "line", role: "target", points: [[0, 0], [0, -300]] },
    { frame: ADDRESS, kind: "scale", role: "ball", points: [[200, 200], [242.67, 200]], lengthMm: scaleLengthMm },
    faceLine(ADDRESS, s.aimDeg),
    faceLine(IMPACT - 10, s.faceDeg - 10 * s.rotationPerFrameDeg),
    faceLine(IMPACT - 5, s.faceDeg - 5 * s.rotationPerFrameDeg),
    faceLine(IMPACT, s.faceDeg),
    faceLine(IMPACT + 1, s.faceDeg + s.rotationPerFrameDeg + s.twistDeg),
  ];
  for (let k = 0; k < 4; k++) marks.push({ frame: IMPACT - 3 + k, kind: "point", role: "clubhead", points: [along([0, 60], direction(s.pathDeg), (k - 3) * 6)] });
  // An older clubhead point far off the path: only the last four count.
  marks.push({ frame: IMPACT - 30, kind: "point", role: "clubhead", points: [[90, 200]] });
  for (let k = 1; k <= 6; k++) marks.push({ frame: IMPACT + k, kind: "point", role: "ball", points: [along([0, 0], direction(s.startDeg), k * s.ballStepPx)] });
  return marks.map((m, i) => ({ ...m, id: `m${i}`, points: m.kind === "scale" ? m.points : m.points.map(place) }));
}

/** Scale marks are placed separately so tests can choose whether a transform also scales the ruler. */
export function placeScale(marks: StoredMark[], place: (p: Vec2) => Vec2): StoredMark[] {
  return marks.map((m) => (m.kind === "scale" ? { ...m, points: m.points.map(place) } : m));
}

export function overheadClip(over: Partial<ClipContext> = {}): ClipContext {
  return {
    view: "overhead",
    width: 1920,
    height: 1080,
    frameCount: 1000,
    captureFps: 240,
    handedness: "right",
    mirrored: false,
    moments: { address: ADDRESS, impact: IMPACT },
    staticLoftDeg: 3,
    frictionMu: 0.2,
    ...over,
  };
}

export function valuesByKey(list: { key: string; value: number | null }[]): Record<string, number | null> {
  return Object.fromEntries(list.map((m) => [m.key, m.value]));
}
