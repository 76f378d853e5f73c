import { describe, expect, it } from "vitest";
import { createBody, fieldsOf, moveHandle, patchBody, replaceMark, withoutMark, type ReviewMark } from "@/lib/review/marks";

const scale: ReviewMark = { id: "s", frame: 4, kind: "scale", role: "ball", points: [[0, 0], [40, 0]], lengthMm: 42.67, widthMm: null, heightMm: null, version: 3 };

describe("mark data for the API", () => {
  it("a create body carries the kind and only the lengths that are set", () => {
    expect(createBody(scale)).toEqual({ frame: 4, kind: "scale", role: "ball", points: [[0, 0], [40, 0]], lengthMm: 42.67 });
  });
  it("a patch body carries the version and leaves out empty fields", () => {
    expect(patchBody(3, fieldsOf(scale))).toEqual({ version: 3, frame: 4, role: "ball", points: [[0, 0], [40, 0]], lengthMm: 42.67 });
    expect(patchBody(7, { role: "ground" })).toEqual({ version: 7, role: "ground" });
  });
  it("moving a handle changes only that point, to 0.01 px", () => {
    expect(moveHandle(scale.points, 1, [41.23456, 2.0001])).toEqual([[0, 0], [41.23, 2]]);
  });
  it("replaces and removes marks by id", () => {
    const other: ReviewMark = { ...scale, id: "o" };
    expect(replaceMark([scale, other], { ...other, version: 9 })[1]!.version).toBe(9);
    expect(withoutMark([scale, other], "s").map((m) => m.id)).toEqual(["o"]);
  });
});
