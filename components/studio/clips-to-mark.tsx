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
            <li key={clip.id} className="flex items-baseline justify-between py-2">
              <span>{clip.golferName}</span>
              <span className="text-label text-slate-600">{clip.view}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
