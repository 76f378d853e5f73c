import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findHeadEdge, findShaftLine, type HeadSearch } from "@/lib/tracking/head";
import { Canvas } from "./render";

const TURF = 110, HEAD = 40, BALL = 240;
const W = 320, H = 240;
const deg = (a: number) => (a * Math.PI) / 180;

/** Overhead: the head's front edge centred at (fx, fy), the face normal at `faceDeg` right of −y. */
function overheadScene(fx: number, fy: number, faceDeg: number, withHead = true, noise?: number) {
  const a = deg(faceDeg);
  const along: [number, number] = [Math.cos(a), Math.sin(a)];
  const normal: [number, number] = [Math.sin(a), -Math.cos(a)];
  const depth = 30, length = 100;
  const c = new Canvas(W, H, TURF).disc(160, 70, 20, BALL);
  if (withHead) c.box(fx - normal[0] * depth / 2, fy - normal[1] * depth / 2, along, length, depth, HEAD);
  return c.toImage(noise ? { seed: Math.round(fx * 100 + fy), sd: noise } : undefined);
}

const search = (towards: [number, number]): HeadSearch => ({ box: { x0: 0, y0: 0, x1: W, y1: H }, towards, sign: 1, threshold: 20, noise: 1 });

describe("clubhead leading edge (overhead)", () => {
  const background = overheadScene(0, 0, 0, false);

  it("puts the point on the middle of the leading edge to 0.15 px and the face line to 0.1°", () => {
    const edge = findHeadEdge(overheadScene(160.3, 120.7, 0), background, search([0, -1]))!;
    expect(Math.hypot(edge.point[0] - 160.3, edge.point[1] - 120.7)).toBeLessThan(0.15);
    const angle = (Math.atan2(edge.ends[1][1] - edge.ends[0][1], edge.ends[1][0] - edge.ends[0][0]) * 180) / Math.PI;
    expect(Math.abs(((angle + 90) % 180) - 90)).toBeLessThan(0.1);
  });

  it("moves with the scene: a translated head moves its point by the same vector (property)", () => {
    const base = findHeadEdge(overheadScene(160, 125, 1.5), background, search([0, -1]))!;
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: -8, max: 30, noNaN: true }), (dx, dy) => {
        const moved = findHeadEdge(overheadScene(160 + dx, 125 + dy, 1.5), background, search([0, -1]))!;
        expect(Math.abs(moved.point[0] - base.point[0] - dx)).toBeLessThan(0.2);
        expect(Math.abs(moved.point[1] - base.point[1] - dy)).toBeLessThan(0.2);
      }),
      { numRuns: 15, seed: 3 },
    );
  });

  it("turns with the scene: a rotated face turns the fitted line by the same angle (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -6, max: 6, noNaN: true }), (faceDeg) => {
        const edge = findHeadEdge(overheadScene(160, 125, faceDeg), background, search([0, -1]))!;
        const [a, b] = edge.ends;
        const angle = (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
        const line = ((angle % 180) + 180) % 180;
        const folded = line > 90 ? line - 180 : line;
        expect(Math.abs(folded - faceDeg)).toBeLessThan(0.15);
      }),
      { numRuns: 15, seed: 4 },
    );
  });

  it("states a point precision that covers the error under sensor noise (σ = 3)", () => {
    let covered = 0;
    const runs = 20;
    for (let i = 0; i < runs; i++) {
      const fx = 160 + i * 0.13, fy = 125 + i * 0.07;
      const edge = findHeadEdge(overheadScene(fx, fy, 0, true, 3), background, { ...search([0, -1]), noise: 3 })!;
      if (Math.hypot(edge.point[0] - fx, edge.point[1] - fy) <= Math.SQRT2 * edge.pointPrecisionPx) covered++;
    }
    expect(covered / runs).toBeGreaterThan(0.5);
  });

  it("finds no head where nothing differs from the background", () => {
    expect(findHeadEdge(background, background, search([0, -1]))).toBeNull();
  });
});

describe("shaft line (face-on)", () => {
  it("fits the shaft rising from the head to 0.2° whatever its lean (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -12, max: 12, noNaN: true }), (leanDeg) => {
        const hosel: [number, number] = [150, 178];
        const top: [number, number] = [hosel[0] + Math.sin(deg(leanDeg)) * 170, hosel[1] - Math.cos(deg(leanDeg)) * 170];
        const draw = (withClub: boolean) => {
          const c = new Canvas(W, H, TURF).disc(200, 190, 10, BALL);
          if (withClub) c.box(165, 185, [1, 0], 60, 14, HEAD).segment(hosel, top, 4, HEAD);
          return c.toImage();
        };
        const s = search([1, 0]);
        const head = findHeadEdge(draw(true), draw(false), s)!;
        expect(head).not.toBeNull();
        const shaft = findShaftLine(draw(true), draw(false), s, head)!;
        const [a, b] = shaft.ends;
        const lower = a[1] > b[1] ? a : b, upper = a[1] > b[1] ? b : a;
        const lean = (Math.atan2(upper[0] - lower[0], lower[1] - upper[1]) * 180) / Math.PI;
        expect(Math.abs(lean - leanDeg)).toBeLessThan(0.2);
      }),
      { numRuns: 12, seed: 9 },
    );
  });
});
