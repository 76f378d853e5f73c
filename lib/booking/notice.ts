// The studio's notice rule: a golfer who cancels at least `noticeHours` before the start gets
// the fee back and may move the visit; later than that the visit stays as booked.
const HOUR_MS = 3_600_000;

export function withinNotice(startsAt: Date, at: Date, noticeHours: number): boolean {
  return startsAt.getTime() - at.getTime() >= noticeHours * HOUR_MS;
}

/** Staff cancelling or declining always refund; a golfer only inside the notice rule. */
export function refundOnCancel(by: "golfer" | "staff", startsAt: Date, at: Date, noticeHours: number): boolean {
  return by === "staff" || withinNotice(startsAt, at, noticeHours);
}
