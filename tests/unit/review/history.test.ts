import { describe, expect, it } from "vitest";
import { canRedo, canUndo, emptyHistory, inverse, record, redo, renameMark, undo, type Command } from "@/lib/review/history";
import type { ReviewMark } from "@/lib/review/marks";

const mark = (id: string, x = 0): ReviewMark => ({ id, frame: 3, kind: "line", role: "face", points: [[x, 0], [x + 10, 0]], version: 1 });

describe("undo history", () => {
  it("undo hands back the inverse of the last command; redo the command itself", () => {
    const created: Command = { type: "create", mark: mark("a") };
    let h = record(emptyHistory(), created);
    expect(canUndo(h)).toBe(true);
    const u = undo(h)!;
    expect(u.apply).toEqual({ type: "delete", mark: mark("a") });
    h = u.history;
    expect(canUndo(h)).toBe(false);
    expect(canRedo(h)).toBe(true);
    const r = redo(h)!;
    expect(r.apply).toEqual(created);
    expect(canRedo(r.history)).toBe(false);
  });

  it("an update's inverse swaps before and after", () => {
    const before = { frame: 3, role: "face" as const, points: [[0, 0], [1, 0]] as [number, number][], lengthMm: null, widthMm: null, heightMm: null };
    const after = { ...before, points: [[0, 0], [2, 0]] as [number, number][] };
    expect(inverse({ type: "update", id: "a", before, after })).toEqual({ type: "update", id: "a", before: after, after: before });
  });

  it("a new command clears the redo stack", () => {
    let h = record(emptyHistory(), { type: "create", mark: mark("a") });
    h = undo(h)!.history;
    h = record(h, { type: "create", mark: mark("b") });
    expect(canRedo(h)).toBe(false);
    expect(h.past).toHaveLength(1);
  });

  it("undo and redo on an empty history do nothing", () => {
    expect(undo(emptyHistory())).toBeNull();
    expect(redo(emptyHistory())).toBeNull();
  });

  it("renaming a re-created mark updates every command about it, and no other", () => {
    let h = record(emptyHistory(), { type: "create", mark: mark("a") });
    h = record(h, { type: "update", id: "a", before: mark("a"), after: mark("a", 5) });
    h = record(h, { type: "delete", mark: mark("b") });
    const renamed = renameMark(h, "a", "a2");
    expect(renamed.past.map((c) => (c.type === "update" ? c.id : c.mark.id))).toEqual(["a2", "a2", "b"]);
  });

  it("three undos walk back three commands in reverse order", () => {
    let h = emptyHistory();
    for (const id of ["a", "b", "c"]) h = record(h, { type: "create", mark: mark(id) });
    const order: string[] = [];
    for (let i = 0; i < 3; i++) {
      const u = undo(h)!;
      order.push(u.apply.type === "update" ? u.apply.id : u.apply.mark.id);
      h = u.history;
    }
    expect(order).toEqual(["c", "b", "a"]);
  });
});
