"use client";
// Last step: the intake basics, the request, then the fee on the provider's payment page.
import { useState } from "react";
import { useFormSubmit } from "@/components/forms/use-form-submit";
import { apiFetch, ApiClientError } from "@/lib/client/api";
import type { PublicStudio, SlotView } from "./booking-flow";
import { money } from "./format";

type Props = { studio: PublicStudio; type: PublicStudio["fittingTypes"][number]; slot: SlotView; signedInAs: string; onTaken: () => void };

export function RequestStep({ studio, type, slot, signedInAs, onTaken }: Props) {
  const [booking, setBooking] = useState<{ id: string } | null>(null);
  const { onSubmit, pending, setPending, error, setError } = useFormSubmit(
    async (form) => {
      const text = (name: string) => String(form.get(name) ?? "").trim() || undefined;
      const made = await apiFetch<{ id: string }>(`/api/booking/studios/${studio.slug}/bookings`, {
        method: "POST",
        body: {
          fittingTypeId: type.id, fitterUserId: slot.fitterUserId, startsAt: slot.start, handedness: form.get("handedness"),
          intake: { puttingStyle: text("puttingStyle"), usualMiss: text("usualMiss"), currentPutter: { headStyle: text("headStyle") } },
        },
      });
      setBooking(made);
    },
    // Someone else took the slot meanwhile: show the free times again.
    { onError: (err) => err instanceof ApiClientError && err.status === 409 && onTaken() },
  );

  async function pay() {
    setPending(true);
    try {
      const { url } = await apiFetch<{ url: string }>(`/api/booking/bookings/${booking!.id}/pay`, { method: "POST" });
      window.location.assign(url);
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Something went wrong");
      setPending(false);
    }
  }

  if (booking) {
    return (
      <section className="card" aria-labelledby="sent-heading">
        <h2 id="sent-heading" className="text-title">Request sent</h2>
        <p className="mt-2">{slot.day} at <span className="num">{slot.time}</span> with {slot.fitterName}. The studio will confirm by e-mail.</p>
        <p className="mt-2 text-slate-600">Pay the fee now, or after your visit. Cancel at least {studio.cancelNoticeHours} hours ahead for a full refund.</p>
        {error && <p role="alert" className="field-error">{error}</p>}
        <div className="mt-4 flex flex-wrap gap-2">
          <button type="button" className="btn-primary" onClick={pay} disabled={pending}>Pay {money(type.feeMinor, studio.currency)} now</button>
          <a className="btn-quiet" href={`/book/${studio.slug}/bookings`}>My bookings</a>
        </div>
      </section>
    );
  }

  return (
    <section className="card" aria-labelledby="request-heading">
      <h2 id="request-heading" className="field-label">4 · About your putting</h2>
      <p className="mb-3 text-label text-slate-600">Signed in as {signedInAs}</p>
      <form onSubmit={onSubmit} className="grid gap-3 sm:grid-cols-2" noValidate>
        <div>
          <label htmlFor="handedness" className="field-label">You putt</label>
          <select id="handedness" name="handedness" className="field" defaultValue="right">
            <option value="right">right-handed</option>
            <option value="left">left-handed</option>
          </select>
        </div>
        <div>
          <label htmlFor="headStyle" className="field-label">Current putter head</label>
          <input id="headStyle" name="headStyle" className="field" placeholder="blade, mallet …" />
        </div>
        <div>
          <label htmlFor="puttingStyle" className="field-label">Stroke and grip</label>
          <input id="puttingStyle" name="puttingStyle" className="field" />
        </div>
        <div>
          <label htmlFor="usualMiss" className="field-label">Usual miss</label>
          <input id="usualMiss" name="usualMiss" className="field" />
        </div>
        {error && <p role="alert" className="field-error sm:col-span-2">{error}</p>}
        <button type="submit" className="btn-primary sm:col-span-2" disabled={pending}>
          Request {slot.day} {slot.time} · {money(type.feeMinor, studio.currency)}
        </button>
      </form>
    </section>
  );
}
