// Free fitting slots from weekly opening hours kept in the studio's local time. Pure: the
// wall-clock → instant conversion uses luxon, which reads the IANA tz database through Intl,
// so daylight-saving changes come from that database, not from rules of our own.
import { DateTime } from "luxon";

export type WeeklyRule = { fitterUserId: string; weekday: number; startMinute: number; endMinute: number };
/** A closed local day; `fitterUserId: null` closes the whole studio. */
export type ClosedDay = { fitterUserId: string | null; day: string };
/** A span already held on a fitter's diary, [start, blockedUntil) in UTC. */
export type Busy = { fitterUserId: string; start: Date; blockedUntil: Date };
export type Slot = { fitterUserId: string; start: Date; end: Date; blockedUntil: Date };

export type SlotQuery = {
  timeZone: string;
  rules: WeeklyRule[];
  closed: ClosedDay[];
  busy: Busy[];
  durationMin: number;
  bufferMin: number;
  /** The search runs over local days from `from` (inclusive) to `to` (exclusive), instants in UTC. */
  from: Date;
  to: Date;
  /** Slots starting before this instant are not offered (now plus a lead time). */
  notBefore: Date;
};

const MINUTE_MS = 60_000;

/** The UTC instant of a local wall-clock time; a time inside a spring-forward gap moves forward with the clock. */
export function localToUtc(day: string, minuteOfDay: number, timeZone: string): Date {
  const midnight = DateTime.fromISO(day, { zone: timeZone });
  if (!midnight.isValid) throw new Error(`Bad day or time zone: ${day} ${timeZone}`);
  // 24:00 (a window to midnight) is the next day's 00:00.
  if (minuteOfDay >= 1440) return midnight.plus({ days: 1 }).toJSDate();
  const { year, month, day: dayOfMonth } = midnight;
  return DateTime.fromObject({ year, month, day: dayOfMonth, hour: Math.floor(minuteOfDay / 60), minute: minuteOfDay % 60 }, { zone: timeZone }).toJSDate();
}

/** The local days (yyyy-mm-dd) that the UTC span [from, to) touches. */
export function localDays(from: Date, to: Date, timeZone: string): string[] {
  const days: string[] = [];
  let day = DateTime.fromJSDate(from, { zone: timeZone }).startOf("day");
  const last = DateTime.fromJSDate(new Date(to.getTime() - 1), { zone: timeZone }).startOf("day");
  while (day <= last) {
    days.push(day.toISODate()!);
    day = day.plus({ days: 1 });
  }
  return days;
}

const overlaps = (aStart: number, aEnd: number, bStart: number, bEnd: number) => aStart < bEnd && bStart < aEnd;

/**
 * Every start a fitter can take: inside each opening window the fitting (not its buffer) must
 * end by the window's end; slots follow each other every duration + buffer of real time; a
 * slot whose [start, end + buffer) meets a busy span, a closed day or the lead time is left out.
 */
export function freeSlots(q: SlotQuery): Slot[] {
  const durationMs = q.durationMin * MINUTE_MS;
  const stepMs = (q.durationMin + q.bufferMin) * MINUTE_MS;
  const slots: Slot[] = [];
  for (const day of localDays(q.from, q.to, q.timeZone)) {
    const weekday = DateTime.fromISO(day, { zone: q.timeZone }).weekday;
    for (const rule of q.rules.filter((r) => r.weekday === weekday)) {
      if (q.closed.some((c) => c.day === day && (c.fitterUserId === null || c.fitterUserId === rule.fitterUserId))) continue;
      const windowEnd = localToUtc(day, rule.endMinute, q.timeZone).getTime();
      const busy = q.busy.filter((b) => b.fitterUserId === rule.fitterUserId);
      for (let start = localToUtc(day, rule.startMinute, q.timeZone).getTime(); start + durationMs <= windowEnd; start += stepMs) {
        const blockedUntil = start + stepMs;
        if (start < q.notBefore.getTime() || start < q.from.getTime() || start >= q.to.getTime()) continue;
        if (busy.some((b) => overlaps(start, blockedUntil, b.start.getTime(), b.blockedUntil.getTime()))) continue;
        slots.push({ fitterUserId: rule.fitterUserId, start: new Date(start), end: new Date(start + durationMs), blockedUntil: new Date(blockedUntil) });
      }
    }
  }
  slots.sort((a, b) => a.start.getTime() - b.start.getTime() || a.fitterUserId.localeCompare(b.fitterUserId));
  // Overlapping opening windows of one fitter would offer clashing starts: keep the earlier one.
  const lastEnd = new Map<string, number>();
  return slots.filter((slot) => {
    if (slot.start.getTime() < (lastEnd.get(slot.fitterUserId) ?? -Infinity)) return false;
    lastEnd.set(slot.fitterUserId, slot.blockedUntil.getTime());
    return true;
  });
}

/** "09:30" ↔ 570: opening hours are edited as local clock times. */
export function parseClock(value: string): number {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$|^24:00$/.exec(value);
  if (!match) throw new Error(`Not a clock time: ${value}`);
  return value === "24:00" ? 1440 : Number(match[1]) * 60 + Number(match[2]);
}

export const formatClock = (minute: number) => `${String(Math.floor(minute / 60)).padStart(2, "0")}:${String(minute % 60).padStart(2, "0")}`;
