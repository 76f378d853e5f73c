"use client";

import { useEffect, useEffectEvent } from "react";
import { commandForKey, type KeyCommand } from "@/lib/review/keys";

const typingInto = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(t.tagName));

/** Binds the review keys to the window; Space is reported held/released for panning. */
export function useReviewKeys(onCommand: (c: KeyCommand) => void, onSpace: (held: boolean) => void, paused: boolean) {
  const down = useEffectEvent((e: KeyboardEvent) => {
    if (typingInto(e.target)) return;
    if (e.key === " ") {
      e.preventDefault();
      if (!e.repeat) onSpace(true);
      return;
    }
    const command = commandForKey(e);
    if (!command || (paused && command.type !== "help")) return;
    e.preventDefault();
    onCommand(command);
  });
  const up = useEffectEvent((e: KeyboardEvent) => {
    if (e.key === " ") onSpace(false);
  });
  useEffect(() => {
    const onDown = (e: KeyboardEvent) => down(e);
    const onUp = (e: KeyboardEvent) => up(e);
    window.addEventListener("keydown", onDown);
    window.addEventListener("keyup", onUp);
    return () => {
      window.removeEventListener("keydown", onDown);
      window.removeEventListener("keyup", onUp);
    };
  }, []);
}
