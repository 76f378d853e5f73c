import Link from "next/link";

type Item = { fitting: { id: string; scheduledAt: Date; status: string }; golferName: string };

const statusWords: Record<string, string> = { planned: "booked", in_progress: "in progress", completed: "done" };

export function TodayList({ items }: { items: Item[] }) {
  return (
    <section className="card" aria-labelledby="today-heading">
      <h2 id="today-heading" className="field-label">Today&apos;s fittings</h2>
      {items.length === 0 ? (
        <p className="text-slate-600">No fittings booked today.</p>
      ) : (
        <ul className="divide-y divide-chalk-200">
          {items.map(({ fitting, golferName }) => (
            <li key={fitting.id} className="flex items-baseline justify-between py-2">
              <Link href={`/studio/fittings/${fitting.id}`} className="underline-offset-2 hover:underline">{golferName}</Link>
              <span className="num text-label text-slate-600">
                {fitting.scheduledAt.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" })} · {statusWords[fitting.status]}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
