"use client";
// Putt by putt: every overhead putt of every build with its face, path and start direction, the
// side in words; a row opens the clip on the review screen.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { signedWithWords } from "@/lib/format/signed";
import { signWordsFor } from "@/lib/metrics/keys";
import type { ComparisonReply } from "./types";

const COLUMNS = [
  { key: "face", metric: "face_angle_impact", title: "Face at impact" },
  { key: "path", metric: "path", title: "Path" },
  { key: "start", metric: "start_direction", title: "Start direction" },
] as const;

export function PuttTable({ data }: { data: ComparisonReply }) {
  const router = useRouter();
  const handedness = data.handedness ?? "right";
  const rows = data.builds.flatMap((b) => b.putts.map((p) => ({ build: b, p })));
  if (rows.length === 0) return null;
  return (
    <section className="card overflow-x-auto" aria-labelledby="putts-heading">
      <h3 id="putts-heading" className="field-label">Putt by putt (overhead); a row opens the clip</h3>
      <table className="num w-full text-left text-label" data-testid="putt-table">
        <thead className="uppercase text-slate-600">
          <tr>
            <th className="py-1 pr-3">Build</th><th className="py-1 pr-3">Putt</th>
            {COLUMNS.map((c) => <th key={c.key} className="py-1 pr-3 text-right">{c.title}</th>)}
          </tr>
        </thead>
        <tbody className="divide-y divide-chalk-200">
          {rows.map(({ build, p }) => (
            <tr key={p.clipId} className="cursor-pointer hover:bg-chalk-200" data-testid="putt-row" onClick={() => router.push(`/studio/clips/${p.clipId}`)}>
              <td className="py-1 pr-3">{build.label}</td>
              <td className="py-1 pr-3"><Link href={`/studio/clips/${p.clipId}`} className="underline" onClick={(e) => e.stopPropagation()}>putt {p.putt}</Link></td>
              {COLUMNS.map((c) => {
                const v = p[c.key];
                return <td key={c.key} className="whitespace-nowrap py-1 pr-3 text-right">{v === null ? "—" : signedWithWords(v, 1, "°", signWordsFor("overhead", c.metric, handedness))}</td>;
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
