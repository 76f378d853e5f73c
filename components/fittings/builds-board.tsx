// The fitting's builds side by side: their numbers, equipment-rule warnings and swing weight.
import type { BuildChecks } from "@/lib/compare/build-checks";
import { RULES_OF_THUMB, swingWeightChange, type BuildMasses } from "@/lib/compare/swing-weight";
import { fieldsForGrips, fieldText } from "./build-fields";
import { DuplicateBuild } from "./duplicate-build";

type Build = BuildMasses & BuildChecks & Record<string, unknown> & { id: string; label: string; isBaseline: boolean; clipCount: number };

const points = (p: number) => `${p > 0 ? "+" : p < 0 ? "−" : ""}${Math.abs(p).toFixed(1)}`;

export function BuildsBoard({ builds, canEdit }: { builds: Build[]; canEdit: boolean }) {
  if (builds.length === 0) return <p className="text-slate-600">No builds yet: add the golfer&apos;s own putter first.</p>;
  const reference = builds.find((b) => b.isBaseline) ?? builds[0]!;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex gap-4 overflow-x-auto pb-2" role="list" aria-label="Builds">
        {builds.map((b) => {
          const change = b.id === reference.id ? null : swingWeightChange(reference, b);
          return (
            <article key={b.id} role="listitem" className="card flex w-72 shrink-0 flex-col gap-3" aria-labelledby={`build-${b.id}`}>
              <header>
                <h3 id={`build-${b.id}`} className="font-semibold">{b.label}</h3>
                <p className="text-label text-slate-600">{b.isBaseline ? "baseline · " : ""}<span className="num">{b.clipCount}</span> clips</p>
              </header>
              <dl className="grid grid-cols-2 gap-x-3 gap-y-1 text-label">
                {fieldsForGrips(b.gripCount).map((f) => (
                  <div key={f.key} className="contents">
                    <dt className="text-slate-600">{f.label}</dt>
                    <dd className="num text-right">{fieldText(f, b[f.key])}</dd>
                  </div>
                ))}
              </dl>
              {b.warnings.length > 0 && (
                <ul className="flex flex-col gap-1 rounded-card border border-signal-dark bg-signal-light p-2 text-label" aria-label="Equipment rules">
                  {b.warnings.map((w) => <li key={w.rule}><strong>{w.message}</strong> <span className="text-slate-700">({w.rule})</span></li>)}
                </ul>
              )}
              <div className="text-label">
                <p className="field-label">Swing weight (14 in fulcrum)</p>
                {b.swingWeight ? (
                  <>
                    <p className="num text-body">{b.swingWeight.letterFromMemory ?? "off the letter scale"} <span className="text-label text-slate-600">({b.swingWeight.points.toFixed(1)} points above A0; letters from memory)</span></p>
                    <p className="text-slate-600">{b.swingWeight.note}</p>
                  </>
                ) : <p className="text-slate-600">Needs head, grip and shaft mass and the length or balance point.</p>}
                {change && (
                  <p className="mt-1">
                    Change from {reference.label}: <span className="num">{change.computedPoints === null ? "—" : `${points(change.computedPoints)} points`}</span>
                    {change.ruleOfThumbPoints !== null && <span className="text-slate-600"> (rules of thumb say <span className="num">{points(change.ruleOfThumbPoints)}</span>)</span>}
                  </p>
                )}
              </div>
              {canEdit && <DuplicateBuild buildId={b.id} label={b.label} />}
            </article>
          );
        })}
      </div>
      <p className="text-label text-slate-600">Rules of thumb (common practice, not measurements): {RULES_OF_THUMB.join("; ")}. One point ≈ 1.75 in·oz.</p>
    </div>
  );
}
