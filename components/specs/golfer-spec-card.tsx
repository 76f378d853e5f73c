// The golfer's current spec on its home screen, with the history of earlier ones.
import Link from "next/link";
import type { SpecData } from "@/lib/compare/spec-data";

type Spec = { id: string; issuedAt: Date; supersededAt: Date | null; data: SpecData };
const day = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
const num = (v: number | null, unit: string) => (v === null ? "—" : `${v}${unit}`);

export function GolferSpecCard({ specs }: { specs: Spec[] }) {
  const current = specs.find((s) => !s.supersededAt);
  const earlier = specs.filter((s) => s.supersededAt);
  return (
    <section className="card" aria-labelledby="spec-heading">
      <h2 id="spec-heading" className="field-label">Your putter spec</h2>
      {!current ? (
        <p className="text-slate-600">No spec issued yet.</p>
      ) : (
        <div className="flex flex-col gap-2">
          <p className="font-medium">{current.data.buildShop.head || current.data.build.label}</p>
          <dl className="num grid grid-cols-3 gap-2 text-center">
            <div><dt className="text-label text-slate-600">Length</dt><dd>{num(current.data.buildShop.lengthIn, " in")}</dd></div>
            <div><dt className="text-label text-slate-600">Lie</dt><dd>{num(current.data.buildShop.lieDeg, "°")}</dd></div>
            <div><dt className="text-label text-slate-600">Loft</dt><dd>{num(current.data.buildShop.loftDeg, "°")}</dd></div>
          </dl>
          <p className="text-label text-slate-600">Issued {day(current.issuedAt)} by {current.data.issuedBy}</p>
          <p className="flex gap-3">
            <Link className="btn-quiet" href={`/me/specs/${current.id}`}>Read the spec</Link>
            <a className="btn-quiet" href={`/api/specs/${current.id}/pdf`}>PDF</a>
          </p>
        </div>
      )}
      {earlier.length > 0 && (
        <details className="mt-3">
          <summary className="min-h-touch cursor-pointer text-slate-600">Earlier specs ({earlier.length})</summary>
          <ul>{earlier.map((s) => <li key={s.id}><Link className="underline" href={`/me/specs/${s.id}`}>{day(s.issuedAt)} · {s.data.build.label}</Link></li>)}</ul>
        </details>
      )}
    </section>
  );
}
