"use client";

import { useEffect, useEffectEvent, useRef } from "react";
import { commandForKey, type KeyCommand } from "@/lib/review/keys";

const typingInto = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(t.tagName));

/**
 * Binds the review keys to the window. Space held is reported for panning (Space + drag); a tap of
 * Space with no pointer pressed meanwhile plays or pauses.
 */
export function useReviewKeys(onCommand: (c: KeyCommand) => void, onSpace: (held: boolean) => void, paused: boolean) {
  const spaceTap = useRef<{ pointerUsed: boolean } | null>(null);
  const down = useEffectEvent((e: KeyboardEvent) => {
    if (typingInto(e.target)) return;
    if (e.key === " ") {
      e.preventDefault();
      if (!e.repeat) {
        spaceTap.current = { pointerUsed: false };
        onSpace(true);
      }
      return;
    }
    const command = commandForKey(e);
    if (!command || (paused && command.type !== "help")) return;
    e.preventDefault();
    onCommand(command);
  });
  const up = useEffectEvent((e: KeyboardEvent) => {
    if (e.key !== " ") return;
    onSpace(false);
    const tap = spaceTap.current;
    spaceTap.current = null;
    if (tap && !tap.pointerUsed && !paused && !typingInto(e.target)) onCommand({ type: "togglePlay" });
  });
  useEffect(() => {
    const onDown = (e: KeyboardEvent) => down(e);
    const onUp = (e: KeyboardEvent) => up(e);
    const onPointer = () => {
      if (spaceTap.current) spaceTap.current.pointerUsed = true;
    };
    window.addEventListener("keydown", onDown);
    window.addEventListener("keyup", onUp);
    window.addEventListener("pointerdown", onPointer, true);
    return () => {
      window.removeEventListener("keydown", onDown);
      window.removeEventListener("keyup", onUp);
      window.removeEventListener("pointerdown", onPointer, true);
    };
  }, []);
}
