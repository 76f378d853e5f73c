"use client";
// The comparison's plots (recharts): face angle per putt, face against path, start directions as a
// fan. Axes are padded to hold every value with its whisker; each build's spread (mean ± sd) is a
// tinted band; labels live in the captions so nothing overlaps; charts have a size on first paint.
import { CartesianGrid, ErrorBar, Legend, ReferenceArea, ReferenceDot, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { paddedDomain } from "@/lib/compare/axes";
import { METRES_PER_FOOT } from "@/lib/physics/units";
import { seriesOf, type ComparisonReply } from "./types";

type Props = { data: ComparisonReply };
const HOLE_RADIUS_IN = 2.125;
// Drawn at this size until the container has measured itself, so the first paint is complete.
const FIRST = (height: number) => ({ width: 520, height });
const tick = { fontSize: 12 };

type Key = "face" | "path" | "start";
/** Every value of `key` with its whisker ends, across builds. */
function reach(data: ComparisonReply, key: Key): number[] {
  return data.builds.flatMap((b) =>
    b.putts.flatMap((p) => {
      const v = p[key];
      const u = p[`${key}Uncertainty`] ?? 0;
      return v === null ? [] : [v - u, v + u];
    }),
  );
}
const spreadOf = (b: ComparisonReply["builds"][number], key: string) => {
  const s = b.stats.find((x) => x.key === key);
  return s && s.summary.sd !== null && s.summary.n >= 2 ? { lo: s.summary.mean - s.summary.sd, hi: s.summary.mean + s.summary.sd } : null;
};

export function FacePerPuttPlot({ data }: Props) {
  const w = data.windows.face_angle_impact;
  const bands = data.builds.map((b) => spreadOf(b, "face_angle_impact"));
  const y = paddedDomain([...reach(data, "face"), ...(w ? [w.min, w.max] : []), ...bands.flatMap((s) => (s ? [s.lo, s.hi] : []))], { withZero: true, minSpan: 2 });
  const lastPutt = Math.max(1, ...data.builds.flatMap((b) => b.putts.map((p) => p.putt)));
  return (
    <figure className="card" data-testid="plot-face">
      <figcaption className="field-label">
        Face angle at impact, putt by putt (°, + open). Whiskers: ± one standard error; tinted bands: each build&apos;s mean ± sd{w ? "; blue: the studio's window" : ""}.
      </figcaption>
      <ResponsiveContainer width="100%" height={280} initialDimension={FIRST(280)}>
        <ScatterChart margin={{ top: 12, right: 20, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="putt" name="Putt" allowDecimals={false} domain={[0.5, lastPutt + 0.5]} ticks={Array.from({ length: lastPutt }, (_, i) => i + 1)} tick={tick}
            label={{ value: "putt", position: "insideBottom", offset: -16, fontSize: 12 }} />
          <YAxis type="number" dataKey="face" name="Face angle" unit="°" domain={y} allowDataOverflow tick={tick} width={48} />
          {w && <ReferenceArea y1={w.min} y2={w.max} fill="#D9E7F5" fillOpacity={0.8} ifOverflow="hidden" />}
          {bands.map((s, i) => s && <ReferenceArea key={data.builds[i]!.buildId} y1={s.lo} y2={s.hi} fill={seriesOf(i).color} fillOpacity={0.08} stroke={seriesOf(i).color} strokeOpacity={0.25} ifOverflow="hidden" />)}
          <Tooltip />
          <Legend verticalAlign="top" height={28} />
          {data.builds.map((b, i) => (
            <Scatter key={b.buildId} name={b.label} data={b.putts.filter((p) => p.face !== null)} fill={seriesOf(i).color} shape={seriesOf(i).shape} line isAnimationActive={false}>
              <ErrorBar dataKey="faceUncertainty" direction="y" width={4} stroke={seriesOf(i).color} />
            </Scatter>
          ))}
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}

export function FaceVsPathPlot({ data }: Props) {
  const x = paddedDomain(reach(data, "path"), { withZero: true, minSpan: 2 });
  const y = paddedDomain(reach(data, "face"), { withZero: true, minSpan: 2 });
  return (
    <figure className="card" data-testid="plot-face-path">
      <figcaption className="field-label">Face angle (+ open) against path (+ in-to-out) at impact, in degrees; whiskers ± one standard error.</figcaption>
      <ResponsiveContainer width="100%" height={280} initialDimension={FIRST(280)}>
        <ScatterChart margin={{ top: 12, right: 20, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="path" name="Path" unit="°" domain={x} allowDataOverflow tick={tick} label={{ value: "path", position: "insideBottom", offset: -16, fontSize: 12 }} />
          <YAxis type="number" dataKey="face" name="Face" unit="°" domain={y} allowDataOverflow tick={tick} width={48} />
          <Tooltip />
          <Legend verticalAlign="top" height={28} />
          {data.builds.map((b, i) => (
            <Scatter key={b.buildId} name={b.label} data={b.putts.filter((p) => p.face !== null && p.path !== null)} fill={seriesOf(i).color} shape={seriesOf(i).shape} isAnimationActive={false}>
              <ErrorBar dataKey="faceUncertainty" direction="y" width={4} stroke={seriesOf(i).color} />
              <ErrorBar dataKey="pathUncertainty" direction="x" width={4} stroke={seriesOf(i).color} />
            </Scatter>
          ))}
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Each putt's start direction drawn from the ball to the hole's distance; the hole at its true width, always in view. */
export function StartFanPlot({ data, distanceFt }: Props & { distanceFt: number }) {
  const lateralIn = (deg: number) => distanceFt * 12 * Math.tan((deg * Math.PI) / 180);
  const metric = data.units === "m";
  const label = metric ? `${(distanceFt * METRES_PER_FOOT).toFixed(2)} m` : `${distanceFt} ft`;
  const widest = Math.max(HOLE_RADIUS_IN * 2, ...data.builds.flatMap((b) => b.putts.flatMap((p) => (p.start === null ? [] : [Math.abs(lateralIn(p.start))]))));
  const [, across] = paddedDomain([-widest, widest], { pad: 0.15 });
  return (
    <figure className="card" data-testid="plot-fan">
      <figcaption className="field-label">Start directions toward a hole at {label}: miss across the line in inches (+ right for a right-hander); blue: the hole&apos;s width.</figcaption>
      <ResponsiveContainer width="100%" height={320} initialDimension={FIRST(320)}>
        <ScatterChart margin={{ top: 12, right: 20, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="x" name="Across" unit=" in" domain={[-across, across]} allowDataOverflow tick={tick} />
          <YAxis type="number" dataKey="y" name="Along" unit=" ft" domain={[0, Math.ceil(distanceFt * 1.12)]} allowDataOverflow tick={tick} width={48} />
          <ReferenceArea x1={-HOLE_RADIUS_IN} x2={HOLE_RADIUS_IN} y1={distanceFt * 0.97} y2={distanceFt * 1.03} fill="#D9E7F5" stroke="#2F6F9F" />
          <ReferenceDot x={0} y={distanceFt} r={3} fill="#0E1A24" />
          {data.builds.flatMap((b, i) =>
            b.putts
              .filter((p) => p.start !== null)
              .map((p, k) => (
                <Scatter
                  key={`${b.buildId}-${p.clipId}`}
                  name={k === 0 ? b.label : undefined}
                  legendType={k === 0 ? seriesOf(i).shape : "none"}
                  data={[{ x: 0, y: 0 }, { x: lateralIn(p.start!), y: distanceFt }]}
                  fill={seriesOf(i).color}
                  line={{ stroke: seriesOf(i).color, strokeWidth: 1 }}
                  shape={() => <g />}
                  isAnimationActive={false}
                />
              )),
          )}
          <Legend verticalAlign="top" height={28} />
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}
