"use client";

import type Konva from "konva";
import { Circle, Group, Line, Text } from "react-konva";
import type { Vec2 } from "@/lib/geometry/vector";
import { angleDegrees, type ReviewMark } from "@/lib/review/marks";
import { ROLE_LOOK } from "./roles-look";

type Props = {
  mark: ReviewMark;
  /** Image pixels per screen pixel: handles and lines keep their size on screen at any zoom. */
  unit: number;
  selected: boolean;
  ghost: boolean;
  /** A tracked mark not yet accepted: the role's colour, quieter, hollow handles, dashed line (LOOK.md). */
  proposal: boolean;
  editable: boolean;
  onSelect: (id: string) => void;
  onDragHandle: (id: string, index: number, to: Vec2, done: boolean) => void;
};

const HANDLE_RADIUS = 8;

/** How the points of each kind join up: a closed quad for a plane, an open polyline otherwise. */
const outline = (m: ReviewMark) => (m.kind === "plane" ? [...m.points, m.points[0]!] : m.points).flat();

export function MarkShape({ mark, unit, selected, ghost, proposal, editable, onSelect, onDragHandle }: Props) {
  const look = ROLE_LOOK[mark.role];
  const isPoint = mark.kind === "point";
  const solidPoint = isPoint && !proposal;
  const select = (e: Konva.KonvaEventObject<PointerEvent>) => {
    if (!editable) return;
    e.cancelBubble = true;
    onSelect(mark.id);
  };
  const handleAt = (e: Konva.KonvaEventObject<DragEvent>): Vec2 => [e.target.x(), e.target.y()];
  return (
    <Group opacity={(ghost ? 0.45 : 1) * (proposal ? 0.65 : 1)} listening={editable} name={proposal ? "proposal" : "mark"}>
      {!isPoint && (
        <Line
          points={outline(mark)}
          stroke={look.colour}
          strokeWidth={(selected ? 3 : 2) * unit}
          hitStrokeWidth={14 * unit}
          lineCap="round"
          lineJoin="round"
          dash={proposal ? [7 * unit, 5 * unit] : undefined}
          onPointerDown={select}
        />
      )}
      {mark.kind === "angle" && mark.points[1] && angleDegrees(mark.points) !== null && (
        <Text
          x={mark.points[1][0] + 12 * unit}
          y={mark.points[1][1] + 10 * unit}
          text={`${angleDegrees(mark.points)!.toFixed(1)}°`}
          fontSize={13 * unit}
          fontStyle="bold"
          fill={look.colour}
          listening={false}
          name="angle-value"
        />
      )}
      {mark.points.map((p, i) => (
        <Group key={i} x={p[0]} y={p[1]} draggable={editable && selected}
          onPointerDown={select}
          onDragMove={(e) => onDragHandle(mark.id, i, handleAt(e), false)}
          onDragEnd={(e) => onDragHandle(mark.id, i, handleAt(e), true)}
        >
          <Circle
            radius={(isPoint ? HANDLE_RADIUS : HANDLE_RADIUS - 1) * unit}
            fill={solidPoint ? look.colour : proposal ? "transparent" : "#0E1A24"}
            stroke={solidPoint ? "#0E1A24" : look.colour}
            strokeWidth={(selected ? 3 : 2) * unit}
          />
          <Text
            text={look.letter}
            fontSize={10 * unit}
            fontStyle="bold"
            fill={solidPoint ? "#0E1A24" : look.colour}
            width={20 * unit}
            height={20 * unit}
            offsetX={10 * unit}
            offsetY={10 * unit}
            align="center"
            verticalAlign="middle"
            listening={false}
          />
        </Group>
      ))}
    </Group>
  );
}
