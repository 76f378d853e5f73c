import { angleDegrees, isProposal, type ReviewMark } from "@/lib/review/marks";
import { ROLE_LOOK } from "./roles-look";

/** The marks on this frame as buttons, so a mark can be selected (then deleted) from the keyboard. */
type Props = { marks: ReviewMark[]; acceptedAt: string | null; selectedId: string | null; onSelect: (id: string) => void };

export function FrameMarks({ marks, acceptedAt, selectedId, onSelect }: Props) {
  return (
    <section aria-labelledby="frame-marks-heading" className="border-t border-ink-700 p-4">
      <h2 id="frame-marks-heading" className="text-label font-medium uppercase text-slate-300">Marks on this frame</h2>
      {marks.length === 0 ? (
        <p className="mt-1 text-label text-slate-400">None yet.</p>
      ) : (
        <ul className="mt-1 flex flex-wrap gap-1.5">
          {marks.map((m) => (
            <li key={m.id}>
              <button type="button" aria-pressed={m.id === selectedId} onClick={() => onSelect(m.id)}
                className={`flex items-center gap-1.5 rounded border px-2 py-1 text-label ${m.id === selectedId ? "border-chalk text-chalk" : "border-ink-600 text-slate-200"}`}>
                {isProposal(m, acceptedAt) ? (
                  <span aria-hidden className="inline-block h-2.5 w-2.5 rounded-full border border-dashed" style={{ borderColor: ROLE_LOOK[m.role].colour }} />
                ) : (
                  <span aria-hidden className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: ROLE_LOOK[m.role].colour }} />
                )}
                {ROLE_LOOK[m.role].label} {m.kind}
                {m.kind === "angle" && angleDegrees(m.points) !== null && <span className="num" data-testid="angle-value">{angleDegrees(m.points)!.toFixed(1)}°</span>}
                {isProposal(m, acceptedAt) && <span className="text-slate-400">(proposed)</span>}
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
