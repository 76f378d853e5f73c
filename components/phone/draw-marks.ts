// Draws marks on the overlay canvas with the plain 2D API (no canvas library on the phone).
import { ROLE_LOOK } from "@/components/review/roles-look";
import type { MarkRole } from "@/lib/marks/types";

export type PlayerMark = { id: string; frame: number; kind: string; role: MarkRole | string; points: [number, number][] };
type Transform = { scale: number; offsetX: number; offsetY: number; ratio: number };

const lookOf = (role: string) => ROLE_LOOK[role as MarkRole] ?? { colour: "#FFFFFF", letter: "?", label: role };

function handle(ctx: CanvasRenderingContext2D, x: number, y: number, colour: string, letter: string | null, ratio: number) {
  ctx.beginPath();
  ctx.arc(x, y, 5 * ratio, 0, Math.PI * 2);
  ctx.fillStyle = colour;
  ctx.fill();
  ctx.lineWidth = 1.5 * ratio;
  ctx.strokeStyle = "#0E1A24";
  ctx.stroke();
  if (letter) {
    ctx.font = `600 ${10 * ratio}px system-ui, sans-serif`;
    ctx.fillStyle = "#FFFFFF";
    ctx.strokeStyle = "#0E1A24";
    ctx.lineWidth = 3 * ratio;
    ctx.strokeText(letter, x + 7 * ratio, y - 7 * ratio);
    ctx.fillText(letter, x + 7 * ratio, y - 7 * ratio);
  }
}

/** Clears the canvas and draws each mark at its opacity. Points are source-frame pixels. */
export function drawMarks(ctx: CanvasRenderingContext2D, marks: { mark: PlayerMark; opacity: number }[], t: Transform) {
  ctx.setTransform(1, 0, 0, 1, 0, 0);
  ctx.clearRect(0, 0, ctx.canvas.width, ctx.canvas.height);
  const at = ([x, y]: [number, number]): [number, number] => [(t.offsetX + x * t.scale) * t.ratio, (t.offsetY + y * t.scale) * t.ratio];
  for (const { mark, opacity } of marks) {
    const { colour, letter } = lookOf(mark.role);
    const pts = mark.points.map(at);
    ctx.globalAlpha = opacity;
    if (pts.length >= 2) {
      ctx.beginPath();
      ctx.moveTo(...pts[0]!);
      for (const p of pts.slice(1)) ctx.lineTo(...p);
      if (mark.kind === "plane") ctx.closePath();
      ctx.lineWidth = 2 * t.ratio;
      ctx.strokeStyle = colour;
      ctx.stroke();
    }
    pts.forEach((p, i) => handle(ctx, p[0], p[1], colour, i === 0 ? letter : null, t.ratio));
  }
  ctx.globalAlpha = 1;
}
