"use client";
// One fitter's weekly opening hours: one window per weekday, in the studio's local time.
import { formatClock } from "@/lib/booking/slots";
import { useSave } from "./use-save";

const WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"];

type Props = { fitter: { id: string; name: string }; rules: { weekday: number; startMinute: number; endMinute: number }[] };

export function WeeklyHoursForm({ fitter, rules }: Props) {
  const { save, pending, error, saved } = useSave();
  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const next = WEEKDAYS.flatMap((_, i) => (form.get(`open-${i + 1}`) ? [{ weekday: i + 1, start: String(form.get(`start-${i + 1}`)), end: String(form.get(`end-${i + 1}`)) }] : []));
    void save(`/api/booking/availability/${fitter.id}`, "PUT", { rules: next });
  }
  return (
    <section className="card" aria-label={`Opening hours of ${fitter.name}`}>
      <h2 className="field-label">Opening hours · {fitter.name}</h2>
      <form onSubmit={onSubmit} className="flex flex-col gap-2">
        {WEEKDAYS.map((name, i) => {
          const rule = rules.find((r) => r.weekday === i + 1);
          return (
            <div key={name} className="grid grid-cols-[8rem_1fr_1fr] items-center gap-2">
              <label className="flex min-h-touch items-center gap-2">
                <input type="checkbox" name={`open-${i + 1}`} defaultChecked={Boolean(rule)} /> {name}
              </label>
              <input aria-label={`${name} opens`} type="time" name={`start-${i + 1}`} defaultValue={formatClock(rule?.startMinute ?? 540)} className="field num" />
              <input aria-label={`${name} closes`} type="time" name={`end-${i + 1}`} defaultValue={formatClock(rule?.endMinute ?? 1020)} className="field num" />
            </div>
          );
        })}
        {error && <p role="alert" className="field-error">{error}</p>}
        <button className="btn-primary self-start" disabled={pending}>{saved ? "Saved" : "Save hours"}</button>
      </form>
    </section>
  );
}
