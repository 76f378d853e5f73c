import Link from "next/link";

type Item = { id: string; view: string; golferName: string; updatedAt: Date };

export function ClipsToMark({ items }: { items: Item[] }) {
  return (
    <section className="card" aria-labelledby="to-mark-heading">
      <h2 id="to-mark-heading" className="field-label">Clips waiting for marks</h2>
      {items.length === 0 ? (
        <p className="text-slate-600">Every ready clip has marks.</p>
      ) : (
        <ul className="divide-y divide-chalk-200">
          {items.map((clip) => (
            <li key={clip.id}>
              <Link href={`/studio/clips/${clip.id}`} className="flex min-h-touch items-center justify-between hover:text-signal-dark">
                <span>{clip.golferName}</span>
                <span className="text-label text-slate-600">{clip.view}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
