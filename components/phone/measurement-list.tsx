// The clip's measurements as a short list of plain sentences with their ± and the studio's windows.
import { measurementSentence, type PhoneMeasurement } from "@/lib/playback/measurement-words";
import type { Handedness } from "@/lib/metrics/types";
import type { View } from "@/lib/marks/types";

export function MeasurementList({ measurements, view, handedness }: { measurements: PhoneMeasurement[]; view: View; handedness: Handedness }) {
  const measured = measurements.filter((m) => m.value !== null);
  return (
    <section aria-labelledby="measurements-heading" className="card p-4">
      <h2 id="measurements-heading" className="field-label">Measurements</h2>
      {measured.length === 0 ? <p className="text-slate-600">Nothing measured on this clip yet.</p> : (
        <ul className="flex flex-col gap-2" data-testid="measurements">
          {measured.map((m) => {
            const s = measurementSentence(m, view, handedness);
            return (
              <li key={m.key}>
                <span className="font-medium">{s.label}:</span>{" "}
                <span className="num">{s.value}</span>
                {s.uncertainty && <> <span className="num font-light text-slate-600" data-testid="uncertainty">{s.uncertainty}</span></>}
                {s.rest && <> {s.rest}</>}
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
