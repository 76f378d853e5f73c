// A session number as LOOK.md writes it: "+1.4°" with an explicit sign, the ± lighter after it,
// the side in words beside it.
import { sideWords, uncertaintyText, valueText } from "@/lib/review/readout";
import type { SessionNumber } from "./types";

export function NumberText({ n, className = "" }: { n: Pick<SessionNumber, "value" | "uncertainty" | "unit" | "signWords">; className?: string }) {
  if (n.value === null) return <span className={`text-slate-500 ${className}`}>—</span>;
  const side = sideWords(n.value, n.unit, n.signWords);
  return (
    <span className={className}>
      <span className="num">{valueText(n.value, n.unit, n.signWords !== null)}</span>
      {n.uncertainty != null && <span className="num font-light opacity-70"> {uncertaintyText(n.uncertainty, n.unit)}</span>}
      {side && <span className="text-label opacity-80"> {side}</span>}
    </span>
  );
}
