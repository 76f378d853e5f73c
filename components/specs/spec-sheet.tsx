// The spec as a printable page (the same lines as the PDF and the e-mail).
import type { SpecData } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";

export function SpecSheet({ spec, id, supersededAt }: { spec: SpecData; id: string; supersededAt: Date | null }) {
  const lines = specLines(spec);
  return (
    <article className="mx-auto flex max-w-3xl flex-col gap-5 bg-white p-6 print:p-0" aria-labelledby="spec-title">
      <header>
        <h1 id="spec-title" className="text-title">Putter spec — {spec.golfer.name}</h1>
        <p className="text-slate-600">{lines.subtitle}</p>
        {supersededAt && <p className="field-error">Replaced by a newer spec on {supersededAt.toLocaleDateString("en-GB")}; kept as history.</p>}
      </header>
      {lines.sections.map((s) => (
        <section key={s.title} aria-label={s.title}>
          <h2 className="field-label">{s.title}</h2>
          <dl className="grid grid-cols-[12rem_1fr] gap-x-4 gap-y-1">
            {s.rows.map(([k, v]) => (
              <div key={k} className="contents"><dt className="text-slate-600">{k}</dt><dd className="num font-medium">{v}</dd></div>
            ))}
          </dl>
        </section>
      ))}
      <p className="text-label text-slate-600">{lines.footer}</p>
      <p className="flex gap-3 print:hidden">
        <a className="btn-quiet" href={`/api/specs/${id}/pdf`}>Download PDF</a>
      </p>
    </article>
  );
}
