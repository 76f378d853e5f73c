"use client";
// Moves a booked visit to another free time of the same fitting type (the studio's notice
// rule is checked by the server, which answers in words when it is too late).
import { useMutation, useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/client/api";
import type { SlotView } from "./booking-flow";
import { localWhen } from "./format";

type Props = { bookingId: string; studioSlug: string; fittingTypeId: string; timeZone: string; onMoved: () => void };

export function ReschedulePicker({ bookingId, studioSlug, fittingTypeId, timeZone, onMoved }: Props) {
  const [open, setOpen] = useState(false);
  const [choice, setChoice] = useState("");
  const slots = useQuery({
    queryKey: ["slots", studioSlug, fittingTypeId],
    enabled: open,
    queryFn: ({ signal }) => apiFetch<{ slots: SlotView[] }>(`/api/booking/studios/${studioSlug}/slots?fittingTypeId=${fittingTypeId}`, { signal }),
  });
  const move = useMutation({
    mutationFn: (slot: SlotView) => apiFetch(`/api/booking/bookings/${bookingId}/reschedule`, { method: "POST", body: { startsAt: slot.start, fitterUserId: slot.fitterUserId } }),
    onSuccess: () => {
      setOpen(false);
      onMoved();
    },
  });
  if (!open) return <button type="button" className="btn-quiet" onClick={() => setOpen(true)}>Move visit</button>;
  const options = (slots.data?.slots ?? []).slice(0, 60);
  return (
    <form
      className="flex w-full flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const slot = options.find((s) => `${s.start}|${s.fitterUserId}` === choice);
        if (slot) move.mutate(slot);
      }}
    >
      <label className="flex flex-col">
        <span className="field-label">New time</span>
        <select className="field" value={choice} onChange={(e) => setChoice(e.target.value)} required aria-describedby={move.error ? `move-error-${bookingId}` : undefined}>
          <option value="">{slots.isPending ? "Finding free times…" : "Choose a time"}</option>
          {options.map((s) => (
            <option key={`${s.start}|${s.fitterUserId}`} value={`${s.start}|${s.fitterUserId}`}>{localWhen(s.start, timeZone)} · {s.fitterName}</option>
          ))}
        </select>
      </label>
      {move.error && <p id={`move-error-${bookingId}`} role="alert" className="field-error">{move.error.message}</p>}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary" disabled={!choice || move.isPending}>Move to this time</button>
        <button type="button" className="btn-quiet" onClick={() => setOpen(false)}>Keep the visit</button>
      </div>
    </form>
  );
}
