// The fee of the booking behind a fitting, as the fitting page shows it (server component).
type Payment = { state: string; amountMinor: number; currency: string } | null;

const words: Record<string, string> = { paid: "paid", pending: "awaiting payment", refunded: "refunded", failed: "payment failed" };

export function FittingFee({ booking }: { booking: { status: string; payment: Payment } | null }) {
  if (!booking) return null;
  const p = booking.payment;
  const amount = p ? new Intl.NumberFormat("en-GB", { style: "currency", currency: p.currency.toUpperCase() }).format(p.amountMinor / 100) : null;
  return (
    <p className="text-slate-600" data-fee-state={p?.state ?? "none"}>
      Booked visit ({booking.status}) · fee {p ? `${amount} ${words[p.state] ?? p.state}` : "not paid yet"}
    </p>
  );
}
