// Shared by the booking API (validation at the edge) and its forms (same messages).
import { z } from "zod";
import { intakeSchema } from "@/lib/schemas/golfer";
import { parseClock } from "./slots";

const clock = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$|^24:00$/, "Use a 24-hour time such as 09:30");
const localDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date such as 2026-12-24");
const instant = z.string().datetime({ offset: true, message: "Use an ISO date-time such as 2026-12-01T09:00:00Z" }).transform((s) => new Date(s));

export const weeklyRulesSchema = z.object({
  rules: z
    .array(z.object({ weekday: z.number().int().min(1).max(7), start: clock, end: clock }))
    .max(50)
    .refine((rules) => rules.every((r) => parseClock(r.start) < parseClock(r.end)), "Each opening must end after it starts")
    .refine((rules) => !rules.some((a, i) => rules.some((b, j) => j > i && a.weekday === b.weekday && parseClock(a.start) < parseClock(b.end) && parseClock(b.start) < parseClock(a.end))),
      "Two openings on the same weekday overlap: join them into one"),
});

export const closedDaySchema = z.object({
  day: localDay,
  fitterUserId: z.string().uuid().nullable().default(null),
  reason: z.string().trim().max(200).default(""),
});

export const fittingTypeSchema = z.object({
  name: z.string().trim().min(1, "Name the fitting").max(100),
  durationMin: z.number().int().min(15).max(480),
  bufferMin: z.number().int().min(0).max(120).default(0),
  feeMinor: z.number().int().min(0).max(1_000_000),
  active: z.boolean().default(true),
});
export const fittingTypeUpdateSchema = fittingTypeSchema.partial();

export const bookingSettingsSchema = z.object({
  cancelNoticeHours: z.number().int().min(0).max(720).optional(),
  currency: z.string().regex(/^[a-z]{3}$/, "A three-letter currency code such as gbp").optional(),
});

export const slotsQuerySchema = z.object({
  fittingTypeId: z.string().uuid(),
  from: localDay.optional(),
  days: z.coerce.number().int().min(1).max(56).default(56),
});

export const bookingCreateSchema = z.object({
  fittingTypeId: z.string().uuid(),
  fitterUserId: z.string().uuid(),
  startsAt: instant,
  handedness: z.enum(["right", "left"]).optional(),
  intake: intakeSchema.default({}),
});

export const rescheduleSchema = z.object({ startsAt: instant, fitterUserId: z.string().uuid().optional() });

export const bookingListQuery = z.object({ from: instant.optional(), to: instant.optional() });

export const golferAccountSchema = z.object({
  name: z.string().trim().min(1, "Enter your name").max(200),
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address"),
  password: z.string().min(10, "Use at least 10 characters").max(200),
  handedness: z.enum(["right", "left"]).default("right"),
});

export const slugParams = z.object({ studio: z.string().regex(/^[a-z0-9-]{1,80}$/, "not a studio address") });
