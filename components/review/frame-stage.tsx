"use client";

import type Konva from "konva";
import { useEffect, useLayoutEffect, useRef, useState } from "react";
import { Circle, Image as KonvaImage, Label, Layer, Line, Stage, Tag, Text } from "react-konva";
import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkRole } from "@/lib/marks/types";
import { isProposal, moveHandle, type ReviewMark } from "@/lib/review/marks";
import { planeSideLabels, type SideLabel, type Tool, type ToolOptions } from "@/lib/review/tools";
import { insideImage, panBy, pinch, screenToImage, zoomAbout, type Size, type Viewport } from "@/lib/review/viewport";
import type { FrameStore } from "./frame-store";
import { Loupe } from "./loupe";
import { MarkShape } from "./mark-shape";
import { ROLE_LOOK } from "./roles-look";

declare global {
  interface Window {
    __lastFramePaintedAt?: number;
  }
}

type Props = {
  image: Size;
  stage: Size;
  store: FrameStore;
  frame: number;
  viewport: Viewport;
  fitScale: number;
  onViewport: (vp: Viewport) => void;
  marks: ReviewMark[];
  ghosts: ReviewMark[];
  selectedId: string | null;
  onSelect: (id: string | null) => void;
  tool: Tool;
  placed: Vec2[];
  role: MarkRole;
  /** The plane tool's known sizes, named on the sides as the corners go down. */
  planeSizes: Pick<ToolOptions, "widthMm" | "heightMm">;
  /** When the fitter accepted the clip's tracking; proposals are drawn quieter until then. */
  acceptedAt: string | null;
  panKey: boolean;
  onPress: (p: Vec2) => void;
  onMoveHandle: (id: string, index: number, to: Vec2) => void;
};

type Drag = { id: string; index: number; to: Vec2 };
type Pan = { from: Vec2; vp: Viewport };

export default function FrameStage(props: Props) {
  const { image, stage, store, frame, viewport: vp, fitScale, onViewport, tool, panKey } = props;
  const imageRef = useRef<Konva.Image>(null);
  const pointers = useRef(new Map<number, Vec2>());
  const pan = useRef<Pan | null>(null);
  const [drag, setDrag] = useState<Drag | null>(null);
  const [hover, setHover] = useState<Vec2 | null>(null);

  // Paint the frame synchronously on the step, then mark it painted for tests and the benchmark.
  useLayoutEffect(() => {
    const draw = () => {
      const bitmap = store.get(frame);
      const node = imageRef.current;
      if (!bitmap || !node) return false;
      node.image(bitmap);
      node.getLayer()?.draw();
      const container = node.getStage()?.container();
      if (container) container.dataset.paintedFrame = String(frame);
      window.__lastFramePaintedAt = performance.now();
      return true;
    };
    if (draw()) return;
    const off = store.subscribe((n) => {
      if (n === frame && draw()) off();
    });
    return off;
  }, [frame, store]);

  useEffect(() => store.preloadAround(frame), [frame, store]);

  const screenPoint = (e: Konva.KonvaEventObject<PointerEvent>): Vec2 => {
    const pos = e.target.getStage()?.getPointerPosition();
    return pos ? [pos.x, pos.y] : [0, 0];
  };

  const onPointerDown = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const p = screenPoint(e);
    pointers.current.set(e.evt.pointerId, p);
    if (pointers.current.size > 1) return void (pan.current = null);
    const empty = e.target === e.target.getStage(); // the frame's layer does not listen, so the stage gets those clicks
    if (panKey || (tool === "select" && empty)) {
      if (tool === "select") props.onSelect(null);
      pan.current = { from: p, vp };
      return;
    }
    if (tool !== "select" && e.evt.button === 0) {
      const at = screenToImage(vp, p);
      if (insideImage(at, image)) props.onPress(at);
    }
  };

  const onPointerMove = (e: Konva.KonvaEventObject<PointerEvent>) => {
    const p = screenPoint(e);
    const before = pointers.current.get(e.evt.pointerId);
    if (before && pointers.current.size === 2) {
      const other = [...pointers.current].find(([id]) => id !== e.evt.pointerId)?.[1];
      pointers.current.set(e.evt.pointerId, p);
      if (other) onViewport(pinch(vp, [before, other], [p, other], fitScale));
      return;
    }
    if (before) pointers.current.set(e.evt.pointerId, p);
    if (pan.current) return onViewport(panBy(pan.current.vp, p[0] - pan.current.from[0], p[1] - pan.current.from[1]));
    if (tool !== "select" && !panKey) setHover(screenToImage(vp, p));
  };

  const onPointerUp = (e: Konva.KonvaEventObject<PointerEvent>) => {
    pointers.current.delete(e.evt.pointerId);
    pan.current = null;
  };
  const onPointerLeave = (e: Konva.KonvaEventObject<PointerEvent>) => {
    onPointerUp(e);
    setHover(null);
  };

  const onWheel = (e: Konva.KonvaEventObject<WheelEvent>) => {
    e.evt.preventDefault();
    const pos = e.target.getStage()?.getPointerPosition();
    if (pos) onViewport(zoomAbout(vp, [pos.x, pos.y], Math.exp(-e.evt.deltaY * 0.0015), fitScale));
  };

  const onDragHandle = (id: string, index: number, to: Vec2, done: boolean) => {
    const clamped: Vec2 = [Math.min(Math.max(to[0], 0), image.width), Math.min(Math.max(to[1], 0), image.height)];
    if (!done) return setDrag({ id, index, to: clamped });
    setDrag(null);
    props.onMoveHandle(id, index, clamped);
  };

  const unit = 1 / vp.scale;
  const shown = (m: ReviewMark) => (drag && drag.id === m.id ? { ...m, points: moveHandle(m.points, drag.index, drag.to) } : m);
  const preview = props.placed.length > 0 ? [...props.placed, ...(hover ? [hover] : [])] : [];
  // The loupe shows frame pixels four times larger than on screen (at least 3 screen px each).
  const loupe = tool !== "select" && !panKey && hover && insideImage(hover, image) ? hover : null;
  const cursor = panKey || tool === "select" ? "grab" : "crosshair";
  const selectedPlane = props.marks.find((m) => m.id === props.selectedId && m.kind === "plane");
  const sideLabels: SideLabel[] =
    tool === "plane" && preview.length > 1
      ? planeSideLabels(preview, props.planeSizes)
      : selectedPlane
        ? planeSideLabels(shown(selectedPlane).points, { widthMm: selectedPlane.widthMm ?? 0, heightMm: selectedPlane.heightMm ?? 0 })
        : [];

  return (
    <>
    <Stage
      width={stage.width}
      height={stage.height}
      scaleX={vp.scale}
      scaleY={vp.scale}
      x={vp.x}
      y={vp.y}
      style={{ cursor, touchAction: "none" }}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={onPointerUp}
      onPointerLeave={onPointerLeave}
      onWheel={onWheel}
    >
      <Layer listening={false}>
        <KonvaImage ref={imageRef} image={undefined} width={image.width} height={image.height} />
      </Layer>
      <Layer listening={tool === "select" && !panKey}>
        {props.ghosts.map((m) => (
          <MarkShape key={m.id} mark={m} unit={unit} selected={false} ghost proposal={isProposal(m, props.acceptedAt)} editable={false} onSelect={props.onSelect} onDragHandle={onDragHandle} />
        ))}
        {props.marks.map((m) => (
          <MarkShape key={m.id} mark={shown(m)} unit={unit} selected={m.id === props.selectedId} ghost={false} proposal={isProposal(m, props.acceptedAt)} editable onSelect={props.onSelect} onDragHandle={onDragHandle} />
        ))}
        {preview.length > 1 && <Line points={preview.flat()} stroke={ROLE_LOOK[props.role].colour} strokeWidth={2 * unit} dash={[6 * unit, 4 * unit]} listening={false} />}
        {props.placed.map((p, i) => (
          <Circle key={i} x={p[0]} y={p[1]} radius={5 * unit} fill={ROLE_LOOK[props.role].colour} listening={false} />
        ))}
        {sideLabels.map((l) => (
          <Label key={l.text} x={l.at[0]} y={l.at[1]} listening={false}>
            <Tag fill="#0E1A24" opacity={0.8} cornerRadius={3 * unit} />
            <Text text={l.text} fontSize={12 * unit} padding={3 * unit} fill={ROLE_LOOK.ground.colour} />
          </Label>
        ))}
      </Layer>
    </Stage>
    {loupe && <Loupe bitmap={store.get(frame)} at={loupe} zoom={Math.max(vp.scale * 4, 3)} pointerOnLeft={imageToScreenX(vp, loupe[0]) < stage.width / 2} />}
    </>
  );
}

const imageToScreenX = (vp: Viewport, x: number) => x * vp.scale + vp.x;
