"use client";
// Confirm or decline a golfer's request from the studio calendar.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch, ApiClientError } from "@/lib/client/api";

export function BookingActions({ bookingId }: { bookingId: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function answer(action: "confirm" | "decline") {
    setPending(true);
    setError(null);
    try {
      await apiFetch(`/api/booking/bookings/${bookingId}/${action}`, { method: "POST" });
      router.refresh();
    } catch (err) {
      setError(err instanceof ApiClientError ? err.message : "Something went wrong");
    } finally {
      setPending(false);
    }
  }

  return (
    <div className="mt-2 flex flex-wrap gap-2">
      <button type="button" className="btn-primary" disabled={pending} onClick={() => answer("confirm")}>Confirm</button>
      <button type="button" className="btn-quiet" disabled={pending} onClick={() => answer("decline")}>Decline</button>
      {error && <p role="alert" className="field-error">{error}</p>}
    </div>
  );
}
