// The iCalendar file attached to booking e-mails (RFC 5545, made by ical-generator). Times
// are written in UTC so every calendar program places the visit at the same instant.
import ical, { ICalCalendarMethod, ICalEventStatus } from "ical-generator";

export type VisitForCalendar = {
  bookingId: string;
  studioName: string;
  fittingTypeName: string;
  fitterName: string;
  start: Date;
  end: Date;
  method: "request" | "cancel";
  /** Grows with every change, so calendar programs replace the older copy (RFC 5545 §3.8.7.4). */
  sequence?: number;
};

export const visitUid = (bookingId: string) => `booking-${bookingId}@fitframe`;

export function visitCalendar(visit: VisitForCalendar): string {
  const calendar = ical({ prodId: { company: "Fitframe", product: "booking", language: "EN" }, name: visit.studioName });
  calendar.method(visit.method === "cancel" ? ICalCalendarMethod.CANCEL : ICalCalendarMethod.REQUEST);
  calendar.createEvent({
    id: visitUid(visit.bookingId),
    start: visit.start,
    end: visit.end,
    summary: `${visit.fittingTypeName} at ${visit.studioName}`,
    description: `Putter fitting with ${visit.fitterName}.`,
    location: visit.studioName,
    status: visit.method === "cancel" ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    sequence: visit.sequence ?? 0,
  });
  return calendar.toString();
}
