"use client";

import dynamic from "next/dynamic";
import { useEffect, useRef, type ComponentProps } from "react";
import type FrameStageType from "./frame-stage";

// Konva needs the browser: the stage is loaded on the client only.
const FrameStage = dynamic(() => import("./frame-stage"), { ssr: false });

type Props = Omit<ComponentProps<typeof FrameStageType>, "stage"> & {
  stage: { width: number; height: number };
  onResize: (size: { width: number; height: number }) => void;
};

/** The dark area the frame fills; measures itself and exposes the viewport for tests. */
export function StageBox({ onResize, ...props }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry) onResize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) });
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [onResize]);
  return (
    <div ref={ref} data-testid="stage" data-viewport={JSON.stringify(props.viewport)} className="absolute inset-0 overflow-hidden bg-ink">
      {props.stage.width > 0 && <FrameStage {...props} />}
    </div>
  );
}
