// Display helpers for booking screens: money and local times in the studio's zone.
import { DateTime } from "luxon";

export const money = (minor: number, currency: string) =>
  new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(minor / 100);

export const localWhen = (iso: string | Date, zone: string, format = "ccc d LLL yyyy, HH:mm") =>
  DateTime.fromJSDate(new Date(iso), { zone }).toFormat(format);

export const paymentWords: Record<string, string> = { pending: "payment started", paid: "paid", refund_pending: "refund on its way", refunded: "refunded" };
export const statusWords: Record<string, string> = { requested: "waiting for the studio", confirmed: "confirmed", declined: "declined", cancelled: "cancelled" };
