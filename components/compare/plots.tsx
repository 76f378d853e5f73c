"use client";
// The comparison's plots (recharts): face angle per putt, face against path, start directions as a fan.
import { CartesianGrid, ErrorBar, Legend, ReferenceArea, ReferenceDot, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { METRES_PER_FOOT } from "@/lib/physics/units";
import { seriesOf, type ComparisonReply } from "./types";

type Props = { data: ComparisonReply };
const HOLE_RADIUS_IN = 2.125;

export function FacePerPuttPlot({ data }: Props) {
  const w = data.windows.face_angle_impact;
  return (
    <figure className="card">
      <figcaption className="field-label">Face angle at impact, putt by putt (° , + open; whiskers ± one standard error)</figcaption>
      <ResponsiveContainer width="100%" height={260}>
        <ScatterChart margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="putt" name="Putt" allowDecimals={false} label={{ value: "putt", position: "insideBottomRight", offset: -4 }} />
          <YAxis type="number" dataKey="face" name="Face angle" unit="°" />
          {w && <ReferenceArea y1={w.min} y2={w.max} fill="#D9E7F5" fillOpacity={0.8} label="window" />}
          <Tooltip />
          <Legend />
          {data.builds.map((b, i) => (
            <Scatter key={b.buildId} name={b.label} data={b.putts.filter((p) => p.face !== null)} fill={seriesOf(i).color} shape={seriesOf(i).shape} line>
              {/* Each putt's own ± (one standard error) as a whisker. */}
              <ErrorBar dataKey="faceUncertainty" direction="y" width={4} stroke={seriesOf(i).color} />
            </Scatter>
          ))}
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}

export function FaceVsPathPlot({ data }: Props) {
  return (
    <figure className="card">
      <figcaption className="field-label">Face angle against path at impact (°)</figcaption>
      <ResponsiveContainer width="100%" height={260}>
        <ScatterChart margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="path" name="Path" unit="°" label={{ value: "path (+ in-to-out)", position: "insideBottomRight", offset: -4 }} />
          <YAxis type="number" dataKey="face" name="Face" unit="°" />
          <Tooltip />
          <Legend />
          {data.builds.map((b, i) => (
            <Scatter key={b.buildId} name={b.label} data={b.putts.filter((p) => p.face !== null && p.path !== null)} fill={seriesOf(i).color} shape={seriesOf(i).shape}>
              <ErrorBar dataKey="faceUncertainty" direction="y" width={4} stroke={seriesOf(i).color} />
              <ErrorBar dataKey="pathUncertainty" direction="x" width={4} stroke={seriesOf(i).color} />
            </Scatter>
          ))}
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}

/** Each putt's start direction drawn from the ball to the hole's distance; the hole as its true width. */
export function StartFanPlot({ data, distanceFt }: Props & { distanceFt: number }) {
  const lateralIn = (deg: number) => distanceFt * 12 * Math.tan((deg * Math.PI) / 180);
  const metric = data.units === "m";
  const label = metric ? `${(distanceFt * METRES_PER_FOOT).toFixed(2)} m` : `${distanceFt} ft`;
  return (
    <figure className="card">
      <figcaption className="field-label">Start directions toward a hole at {label} (miss across the line in inches; + right for a right-hander)</figcaption>
      <ResponsiveContainer width="100%" height={300}>
        <ScatterChart margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#ECE9E1" />
          <XAxis type="number" dataKey="x" name="Across" unit=" in" domain={[-12, 12]} allowDataOverflow />
          <YAxis type="number" dataKey="y" name="Along" unit=" ft" domain={[0, distanceFt]} />
          <ReferenceArea x1={-HOLE_RADIUS_IN} x2={HOLE_RADIUS_IN} y1={distanceFt * 0.97} y2={distanceFt} fill="#D9E7F5" label="hole" />
          <ReferenceDot x={0} y={distanceFt} r={3} fill="#0E1A24" />
          {data.builds.flatMap((b, i) =>
            b.putts
              .filter((p) => p.start !== null)
              .map((p) => (
                <Scatter
                  key={`${b.buildId}-${p.clipId}`}
                  name={p.putt === 1 ? b.label : undefined}
                  legendType={p.putt === 1 ? seriesOf(i).shape : "none"}
                  data={[{ x: 0, y: 0 }, { x: lateralIn(p.start!), y: distanceFt }]}
                  fill={seriesOf(i).color}
                  line={{ stroke: seriesOf(i).color, strokeWidth: 1 }}
                  shape={() => <g />}
                />
              )),
          )}
          <Legend />
        </ScatterChart>
      </ResponsiveContainer>
    </figure>
  );
}
