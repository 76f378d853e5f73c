// Which marks to draw over the playing video, and how strongly (pure).
// A mark belongs to one source frame; it shows from that frame and fades out over a short
// stretch of capture time so the eye can catch it at full speed.

export const HOLD_S = 0.15;

export type FrameMark = { id: string; frame: number };

/** Opacity of a mark at source frame `current`: 1 on its frame, fading to 0 over HOLD_S of capture time, 0 before it. */
export function markOpacity(markFrame: number, current: number, captureFps: number, holdS = HOLD_S): number {
  if (current < markFrame) return 0;
  const age = (current - markFrame) / captureFps;
  if (age === 0) return 1;
  if (age >= holdS) return 0;
  return 1 - age / holdS;
}

/** Marks to draw at `current`, each with its opacity (frames sorted ascending is not required). */
export function visibleMarks<M extends FrameMark>(marks: readonly M[], current: number, captureFps: number, holdS = HOLD_S): { mark: M; opacity: number }[] {
  const out: { mark: M; opacity: number }[] = [];
  for (const mark of marks) {
    const opacity = markOpacity(mark.frame, current, captureFps, holdS);
    if (opacity > 0) out.push({ mark, opacity });
  }
  return out;
}
