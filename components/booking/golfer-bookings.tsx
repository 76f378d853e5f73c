"use client";
// The golfer's booked visits with the studio's answer and the fee's state; pay or cancel here.
// Props: `studioSlug` (optional) adds a "Book another fitting" link to /book/{slug}.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiClientError } from "@/lib/client/api";
import { localWhen, money, paymentWords, statusWords } from "./format";
import { ReschedulePicker } from "./reschedule-picker";

type GolferBooking = {
  id: string; startsAt: string; status: string; feeMinor: number; currency: string; fittingTypeId: string; fittingTypeName: string; fitterName: string; timeZone: string;
  payment: { state: string } | null;
};

export function GolferBookings({ studioSlug }: { studioSlug?: string }) {
  const queryClient = useQueryClient();
  const bookings = useQuery({ queryKey: ["my-bookings"], queryFn: ({ signal }) => apiFetch<GolferBooking[]>("/api/booking/bookings", { signal }) });
  const act = useMutation({
    mutationFn: async ({ id, action }: { id: string; action: "pay" | "cancel" }) => {
      if (action === "cancel" && !window.confirm("Cancel this visit?")) return;
      const answer = await apiFetch<{ url?: string }>(`/api/booking/bookings/${id}/${action}`, { method: "POST" });
      if (answer?.url) window.location.assign(answer.url);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["my-bookings"] }),
  });
  const live = (bookings.data ?? []).filter((b) => b.status === "requested" || b.status === "confirmed");

  return (
    <section className="card" aria-labelledby="bookings-heading">
      <h2 id="bookings-heading" className="field-label">Your booked visits</h2>
      {bookings.isPending && <p className="text-slate-600">Loading…</p>}
      {bookings.isError && <p role="alert" className="field-error">{bookings.error.message}</p>}
      {bookings.data && live.length === 0 && <p className="text-slate-600">No visits booked.</p>}
      <ul className="divide-y divide-chalk-200">
        {live.map((b) => {
          const paid = b.payment?.state === "paid" || b.payment?.state === "refund_pending";
          return (
            <li key={b.id} className="flex flex-col gap-2 py-3" data-booking={b.id}>
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <span className="num font-medium">{localWhen(b.startsAt, b.timeZone)}</span>
                <span className="text-label" data-status={b.status}>{statusWords[b.status]}</span>
              </div>
              <p className="text-label text-slate-600">
                {b.fittingTypeName} with {b.fitterName} · <span className="num">{money(b.feeMinor, b.currency)}</span> ·{" "}
                <span data-payment={b.payment?.state ?? "unpaid"}>{b.payment && b.payment.state !== "pending" ? paymentWords[b.payment.state] : "not paid yet"}</span>
              </p>
              <div className="flex flex-wrap gap-2">
                {!paid && b.feeMinor > 0 && <button type="button" className="btn-primary" disabled={act.isPending} onClick={() => act.mutate({ id: b.id, action: "pay" })}>Pay</button>}
                <button type="button" className="btn-quiet" disabled={act.isPending} onClick={() => act.mutate({ id: b.id, action: "cancel" })}>Cancel visit</button>
                {studioSlug && (
                  <ReschedulePicker bookingId={b.id} studioSlug={studioSlug} fittingTypeId={b.fittingTypeId} timeZone={b.timeZone}
                    onMoved={() => void queryClient.invalidateQueries({ queryKey: ["my-bookings"] })} />
                )}
              </div>
            </li>
          );
        })}
      </ul>
      {act.error && <p role="alert" className="field-error">{act.error instanceof ApiClientError ? act.error.message : "Something went wrong"}</p>}
      {studioSlug && <a className="btn-quiet mt-3 inline-flex" href={`/book/${studioSlug}`}>Book another fitting</a>}
    </section>
  );
}
