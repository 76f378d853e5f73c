"use client";
// The studio's kinds of fitting: length, buffer after, fee.
import { money } from "./format";
import { useSave } from "./use-save";

type FittingType = { id: string; name: string; durationMin: number; bufferMin: number; feeMinor: number; active: boolean };

export function FittingTypesForm({ types, currency }: { types: FittingType[]; currency: string }) {
  const { save, pending, error } = useSave();
  function onAdd(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const target = event.currentTarget;
    void save("/api/booking/fitting-types", "POST", {
      name: form.get("name"), durationMin: Number(form.get("duration")), bufferMin: Number(form.get("buffer")), feeMinor: Math.round(Number(form.get("fee")) * 100),
    }).then((ok) => ok && target.reset());
  }
  return (
    <section className="card" aria-labelledby="types-heading">
      <h2 id="types-heading" className="field-label">Fittings and fees</h2>
      <ul className="mb-4 divide-y divide-chalk-200">
        {types.map((t) => (
          <li key={t.id} className="flex min-h-touch items-center justify-between gap-2">
            <span className={t.active ? "" : "text-slate-500 line-through"}>{t.name}</span>
            <span className="num text-label text-slate-600">{t.durationMin} min + {t.bufferMin} · {money(t.feeMinor, currency)}</span>
            <button type="button" className="btn-quiet" disabled={pending} onClick={() => save(`/api/booking/fitting-types/${t.id}`, "PATCH", { active: !t.active })}>
              {t.active ? "Retire" : "Offer again"}
            </button>
          </li>
        ))}
      </ul>
      <form onSubmit={onAdd} className="grid grid-cols-2 gap-2">
        <div className="col-span-2"><label htmlFor="ft-name" className="field-label">Name</label><input id="ft-name" name="name" required className="field" /></div>
        <div><label htmlFor="ft-duration" className="field-label">Minutes</label><input id="ft-duration" name="duration" type="number" min={15} max={480} defaultValue={60} className="field num" /></div>
        <div><label htmlFor="ft-buffer" className="field-label">Buffer after</label><input id="ft-buffer" name="buffer" type="number" min={0} max={120} defaultValue={15} className="field num" /></div>
        <div><label htmlFor="ft-fee" className="field-label">Fee ({currency.toUpperCase()})</label><input id="ft-fee" name="fee" type="number" min={0} step="0.01" defaultValue={95} className="field num" /></div>
        <button className="btn-primary self-end" disabled={pending}>Add fitting</button>
        {error && <p role="alert" className="field-error col-span-2">{error}</p>}
      </form>
    </section>
  );
}
