"use client";
// One fitter's weekly opening hours in the studio's local time: any number of windows per
// weekday (a split day is two), none for a day off.
import { useState } from "react";
import { formatClock, parseClock } from "@/lib/booking/slots";
import { useSave } from "./use-save";

const WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"];

type Rule = { weekday: number; startMinute: number; endMinute: number };
type Window = { key: number; start: string; end: string };
type Props = { fitter: { id: string; name: string }; rules: Rule[] };

let nextKey = 0;
const windowOf = (start: string, end: string): Window => ({ key: nextKey++, start, end });

function weekOf(rules: Rule[]): Window[][] {
  return WEEKDAYS.map((_, i) =>
    rules
      .filter((r) => r.weekday === i + 1)
      .sort((a, b) => a.startMinute - b.startMinute)
      .map((r) => windowOf(formatClock(r.startMinute), formatClock(r.endMinute))),
  );
}

export function WeeklyHoursForm({ fitter, rules }: Props) {
  const { save, pending, error, saved } = useSave();
  const [week, setWeek] = useState(() => weekOf(rules));
  const changeDay = (day: number, change: (windows: Window[]) => Window[]) => setWeek((w) => w.map((windows, i) => (i === day ? change(windows) : windows)));
  const setTime = (day: number, key: number, edge: "start" | "end", value: string) =>
    changeDay(day, (windows) => windows.map((x) => (x.key === key ? { ...x, [edge]: value } : x)));
  // A new window starts an hour after the day's last one ends (09:00–17:00 on a closed day).
  const addWindow = (day: number) =>
    changeDay(day, (windows) => {
      const lastEnd = windows.length > 0 ? parseClock(windows.at(-1)!.end) : null;
      if (lastEnd === null) return [windowOf("09:00", "17:00")];
      const start = Math.min(lastEnd + 60, 1380);
      return [...windows, windowOf(formatClock(start), formatClock(Math.min(start + 180, 1439)))];
    });

  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    void save(`/api/booking/availability/${fitter.id}`, "PUT", {
      rules: week.flatMap((windows, i) => windows.map(({ start, end }) => ({ weekday: i + 1, start, end }))),
    });
  }

  return (
    <section className="card" aria-label={`Opening hours of ${fitter.name}`}>
      <h2 className="field-label">Opening hours · {fitter.name}</h2>
      <form onSubmit={onSubmit} className="flex flex-col gap-2">
        {WEEKDAYS.map((name, day) => (
          <div key={name} className="grid grid-cols-[7rem_1fr] items-start gap-2" data-weekday={day + 1}>
            <span className="flex min-h-touch items-center font-medium">{name}</span>
            <div className="flex flex-col gap-1">
              {week[day]!.length === 0 && <span className="flex min-h-touch items-center text-slate-500">Closed</span>}
              {week[day]!.map((w, n) => (
                <div key={w.key} className="flex items-center gap-2">
                  <input aria-label={`${name} window ${n + 1} opens`} type="time" required value={w.start} className="field num w-32! flex-none"
                    onChange={(e) => setTime(day, w.key, "start", e.target.value)} />
                  <span aria-hidden>–</span>
                  <input aria-label={`${name} window ${n + 1} closes`} type="time" required value={w.end} className="field num w-32! flex-none"
                    onChange={(e) => setTime(day, w.key, "end", e.target.value)} />
                  <button type="button" className="btn-quiet" aria-label={`Remove ${name} window ${n + 1}`} onClick={() => changeDay(day, (ws) => ws.filter((x) => x.key !== w.key))}>
                    Remove
                  </button>
                </div>
              ))}
              <button type="button" className="btn-quiet self-start" onClick={() => addWindow(day)}>
                Add hours on {name}
              </button>
            </div>
          </div>
        ))}
        {error && <p role="alert" className="field-error">{error}</p>}
        <button className="btn-primary self-start" disabled={pending}>{saved ? "Saved" : "Save hours"}</button>
      </form>
    </section>
  );
}
