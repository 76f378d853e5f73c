import Link from "next/link";

type Golfer = { id: string; name: string; handedness: "right" | "left"; email: string | null };

export function GolferList({ golfers, total }: { golfers: Golfer[]; total: number }) {
  return (
    <section className="card" aria-labelledby="golfers-heading">
      <h2 id="golfers-heading" className="field-label"><Link href="/studio/golfers">Golfers <span className="num">({total})</span></Link></h2>
      {golfers.length === 0 ? (
        <p className="text-slate-600">No golfers yet.</p>
      ) : (
        <ul className="divide-y divide-chalk-200">
          {golfers.map((g) => (
            <li key={g.id} className="flex items-baseline justify-between py-2">
              <Link href={`/studio/golfers/${g.id}`} className="underline-offset-2 hover:underline">{g.name}</Link>
              <span className="text-label text-slate-600">{g.handedness === "left" ? "left-handed" : "right-handed"}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
