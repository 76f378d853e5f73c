"use client";
// Days the studio (or one fitter) takes no bookings.
import { useSave } from "./use-save";

type Props = { days: { id: string; day: string; fitterUserId: string | null; reason: string }[]; fitters: { id: string; name: string }[] };

export function ClosedDaysForm({ days, fitters }: Props) {
  const { save, pending, error } = useSave();
  function onAdd(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    void save("/api/booking/closed-days", "POST", { day: form.get("day"), fitterUserId: form.get("fitter") || null, reason: form.get("reason") });
  }
  const who = (id: string | null) => (id ? (fitters.find((f) => f.id === id)?.name ?? "a fitter") : "whole studio");
  return (
    <section className="card" aria-labelledby="closed-heading">
      <h2 id="closed-heading" className="field-label">Closed days</h2>
      <ul className="mb-4 divide-y divide-chalk-200">
        {days.length === 0 && <li className="text-slate-600">None ahead.</li>}
        {days.map((d) => (
          <li key={d.id} className="flex min-h-touch items-center justify-between gap-2">
            <span className="num">{d.day}</span>
            <span className="text-label text-slate-600">{who(d.fitterUserId)}{d.reason && ` · ${d.reason}`}</span>
            <button type="button" className="btn-quiet" disabled={pending} onClick={() => save(`/api/booking/closed-days/${d.id}`, "DELETE")}>Open again</button>
          </li>
        ))}
      </ul>
      <form onSubmit={onAdd} className="grid grid-cols-2 gap-2">
        <div><label htmlFor="cd-day" className="field-label">Date</label><input id="cd-day" name="day" type="date" required className="field num" /></div>
        <div>
          <label htmlFor="cd-fitter" className="field-label">Who</label>
          <select id="cd-fitter" name="fitter" className="field">
            <option value="">Whole studio</option>
            {fitters.map((f) => <option key={f.id} value={f.id}>{f.name}</option>)}
          </select>
        </div>
        <div className="col-span-2"><label htmlFor="cd-reason" className="field-label">Reason (optional)</label><input id="cd-reason" name="reason" className="field" /></div>
        <button className="btn-primary" disabled={pending}>Close the day</button>
        {error && <p role="alert" className="field-error col-span-2">{error}</p>}
      </form>
    </section>
  );
}
