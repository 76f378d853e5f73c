// The overlay canvas's backing size: the element's CSS size times the pixel ratio, with the
// ratio capped at 2 and the area capped, so that a phone's canvas memory limit is never reached.

export const MAX_PIXEL_RATIO = 2;
// 1440 × 1440 ≈ 2.1 megapixels: far below the ~16.7 MP single-canvas limit of mobile Safari.
export const MAX_CANVAS_PIXELS = 1440 * 1440;

export function overlayCanvasSize(cssWidth: number, cssHeight: number, devicePixelRatio: number) {
  const w = Math.max(0, cssWidth);
  const h = Math.max(0, cssHeight);
  let ratio = Math.min(Math.max(devicePixelRatio || 1, 1), MAX_PIXEL_RATIO);
  if (w * h * ratio * ratio > MAX_CANVAS_PIXELS && w * h > 0) ratio = Math.sqrt(MAX_CANVAS_PIXELS / (w * h));
  return { width: Math.floor(w * ratio), height: Math.floor(h * ratio), ratio };
}

/** Maps source-frame pixels onto the element when the video is letterboxed with object-fit: contain. */
export function containTransform(sourceW: number, sourceH: number, boxW: number, boxH: number) {
  const scale = Math.min(boxW / sourceW, boxH / sourceH);
  return { scale, offsetX: (boxW - sourceW * scale) / 2, offsetY: (boxH - sourceH * scale) / 2 };
}
