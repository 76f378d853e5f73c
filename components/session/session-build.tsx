// One build in the session: its recording switch, its putts as they arrive, its running summary.
import { PuttRow } from "./putt-row";
import { SummaryTable } from "./summary-table";
import type { SessionBuild } from "./types";

type Props = {
  fittingId: string; build: SessionBuild; index: number; canEdit: boolean; leading: boolean;
  builds: { id: string; label: string }[]; onRecord: () => void;
};

export function SessionBuildCard({ fittingId, build, index, canEdit, leading, builds, onRecord }: Props) {
  const counted = build.putts.filter((p) => p.mishit === null).length;
  return (
    <article role="listitem" aria-labelledby={`session-build-${build.id}`} data-build-label={build.label} data-recording={build.recording}
      className={`card flex w-96 shrink-0 flex-col gap-3 ${build.recording ? "border-2 border-signal" : ""}`}>
      <header className="flex items-start justify-between gap-2">
        <div>
          <h3 id={`session-build-${build.id}`} className="font-semibold">
            {index < 9 && <kbd className="mr-2 rounded border border-slate-300 px-1.5 text-label">{index + 1}</kbd>}{build.label}
          </h3>
          <p className="text-label text-slate-600">
            {build.isBaseline ? "baseline · " : ""}<span className="num">{counted}</span> putts counted
            {build.putts.length > counted && <> · <span className="num">{build.putts.length - counted}</span> set aside</>}
            {leading && <span className="ml-1 font-medium text-signal-dark">· leading on consistency</span>}
          </p>
        </div>
        {canEdit && (
          <button type="button" className={build.recording ? "btn-primary" : "btn-quiet"} aria-pressed={build.recording} onClick={onRecord}>
            {build.recording ? "Recording" : "Record here"}
          </button>
        )}
      </header>
      <SummaryTable stats={build.summary} />
      {build.putts.length === 0 ? <p className="text-label text-slate-600">No putts yet.</p> : (
        <ol className="flex flex-col gap-2" aria-label={`Putts of ${build.label}`}>
          {build.putts.map((p, i) => <PuttRow key={p.clipId} fittingId={fittingId} putt={p} number={i + 1} builds={builds} canEdit={canEdit} />)}
        </ol>
      )}
    </article>
  );
}
