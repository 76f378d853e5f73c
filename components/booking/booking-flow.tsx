"use client";
// The public booking page's steps: pick a fitting and a free slot, sign in or create a golfer
// account, give the intake basics, send the request, then pay the fee on the provider's page.
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import { AccountStep } from "./account-step";
import { money } from "./format";
import { RequestStep } from "./request-step";

export type PublicStudio = {
  name: string; slug: string; timeZone: string; currency: string; cancelNoticeHours: number;
  fittingTypes: { id: string; name: string; durationMin: number; feeMinor: number }[];
};
export type SlotView = { fitterUserId: string; fitterName: string; start: string; day: string; time: string };

export function BookingFlow({ studio, signedInAs }: { studio: PublicStudio; signedInAs: string | null }) {
  const [typeId, setTypeId] = useState(studio.fittingTypes[0]?.id ?? "");
  const [slot, setSlot] = useState<SlotView | null>(null);
  const [account, setAccount] = useState(signedInAs);
  const slots = useQuery({
    queryKey: ["slots", studio.slug, typeId],
    enabled: Boolean(typeId),
    queryFn: ({ signal }) => apiFetch<{ slots: SlotView[] }>(`/api/booking/studios/${studio.slug}/slots?fittingTypeId=${typeId}`, { signal }),
  });
  const type = studio.fittingTypes.find((t) => t.id === typeId);
  if (!type) return <p className="card text-slate-600">This studio has no fittings open for booking yet.</p>;
  const byDay = groupByDay(slots.data?.slots ?? []);

  return (
    <div className="flex flex-col gap-6">
      <section className="card" aria-labelledby="type-heading">
        <h2 id="type-heading" className="field-label">1 · Fitting</h2>
        <div className="flex flex-wrap gap-2" role="radiogroup" aria-label="Fitting">
          {studio.fittingTypes.map((t) => (
            <button key={t.id} type="button" role="radio" aria-checked={t.id === typeId} onClick={() => { setTypeId(t.id); setSlot(null); }}
              className={t.id === typeId ? "btn-primary" : "btn-quiet"}>
              {t.name} · <span className="num">{t.durationMin} min · {money(t.feeMinor, studio.currency)}</span>
            </button>
          ))}
        </div>
      </section>
      <section className="card" aria-labelledby="slot-heading">
        <h2 id="slot-heading" className="field-label">2 · Time ({studio.timeZone} time)</h2>
        {slots.isPending && <p className="text-slate-600">Finding free times…</p>}
        {slots.isError && <p role="alert" className="field-error">{slots.error.message}</p>}
        {slots.data && byDay.length === 0 && <p className="text-slate-600">No free times in the next 8 weeks.</p>}
        <div className="flex max-h-96 flex-col gap-3 overflow-y-auto">
          {byDay.map(([day, daySlots]) => (
            <div key={day}>
              <h3 className="text-label font-semibold">{day}</h3>
              <div className="mt-1 flex flex-wrap gap-2">
                {daySlots.map((s) => (
                  <button key={`${s.fitterUserId}-${s.start}`} type="button" data-slot={s.start} aria-pressed={slot?.start === s.start && slot.fitterUserId === s.fitterUserId}
                    onClick={() => setSlot(s)} className={`num min-h-touch ${slot?.start === s.start && slot.fitterUserId === s.fitterUserId ? "btn-primary" : "btn-quiet"}`}>
                    {s.time} · {s.fitterName}
                  </button>
                ))}
              </div>
            </div>
          ))}
        </div>
      </section>
      {slot && !account && <AccountStep slug={studio.slug} onSignedIn={setAccount} />}
      {slot && account && <RequestStep studio={studio} type={type} slot={slot} signedInAs={account} onTaken={() => { setSlot(null); void slots.refetch(); }} />}
    </div>
  );
}

function groupByDay(slots: SlotView[]): [string, SlotView[]][] {
  const days = new Map<string, SlotView[]>();
  for (const s of slots) days.set(s.day, [...(days.get(s.day) ?? []), s]);
  return [...days.entries()].map(([day, list]) => [new Date(`${day}T12:00:00Z`).toLocaleDateString("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" }), list]);
}
