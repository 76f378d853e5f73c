import { z } from "zod";
import { BALL_DIAMETER_MM } from "@/lib/geometry/scale";
import { MARK_ROLES } from "./types";

// zod 4's z.number() already refuses NaN and ±Infinity.
const point = z.tuple([z.number(), z.number()]);
const frame = z.number().int().nonnegative();
const role = z.enum(MARK_ROLES);
const positiveMm = z.number().positive();

/** The body of a mark as the API takes it; the point count is fixed by the kind. */
export const markInputSchema = z.discriminatedUnion("kind", [
  z.object({ frame, kind: z.literal("point"), role, points: z.tuple([point]) }),
  z.object({ frame, kind: z.literal("line"), role, points: z.tuple([point, point]) }),
  z.object({ frame, kind: z.literal("angle"), role, points: z.tuple([point, point, point]) }),
  z.object({ frame, kind: z.literal("scale"), role, points: z.tuple([point, point]), lengthMm: positiveMm.default(BALL_DIAMETER_MM) }),
  z.object({ frame, kind: z.literal("plane"), role, points: z.tuple([point, point, point, point]), widthMm: positiveMm, heightMm: positiveMm }),
]);

export type ParsedMarkInput = z.infer<typeof markInputSchema>;
