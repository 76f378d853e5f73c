import { METRICS_BY_VIEW, type MetricDefinition } from "@/lib/metrics/keys";

/** Every measurement key once, in the order the views list them (overhead, face-on, down-the-line). */
export const METRIC_DEFINITIONS: readonly MetricDefinition[] = (() => {
  const seen = new Map<string, MetricDefinition>();
  for (const defs of Object.values(METRICS_BY_VIEW)) for (const d of defs) if (!seen.has(d.key)) seen.set(d.key, d);
  return [...seen.values()];
})();

export const metricDefinition = (key: string): MetricDefinition =>
  METRIC_DEFINITIONS.find((d) => d.key === key) ?? { key, label: key.replace(/_/g, " "), unit: "", signWords: null };

export const metricOrder = (key: string) => {
  const i = METRIC_DEFINITIONS.findIndex((d) => d.key === key);
  return i === -1 ? METRIC_DEFINITIONS.length : i;
};
