// A fitting's builds, each with its clips, as a phone list. `clipHref` differs for golfer and coach.
import Link from "next/link";
import type { PhoneFitting } from "@/lib/server/dal/golfer-clips";

const viewWords: Record<string, string> = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down the line" };
const stateWords: Record<string, string> = { awaiting_upload: "awaiting upload", queued: "queued", processing: "processing", ready: "ready", failed: "failed" };

export function FittingClips({ data, clipHref }: { data: PhoneFitting; clipHref: (id: string) => string }) {
  return (
    <ol className="flex flex-col gap-4">
      {data.builds.map((b) => (
        <li key={b.id} className="card p-4">
          <h2 className="font-medium">
            {b.label}
            {b.isBaseline && <span className="ml-2 text-label text-slate-600">your putter</span>}
            {b.id === data.chosenBuildId && <span className="ml-2 text-label text-signal-dark">chosen</span>}
          </h2>
          <p className="text-label text-slate-600">{[b.headModel, b.lengthIn ? `${b.lengthIn} in` : "", b.loftDeg !== null ? `${b.loftDeg}° loft` : ""].filter(Boolean).join(" · ")}</p>
          {b.clips.length === 0 ? <p className="mt-2 text-slate-600">No clips.</p> : (
            <ul className="mt-2 grid grid-cols-2 gap-2">
              {b.clips.map((c, i) => (
                <li key={c.id}>
                  {c.state === "ready" ? (
                    <Link href={clipHref(c.id)} className="block overflow-hidden rounded-card border border-chalk-300 bg-ink" aria-label={`${viewWords[c.view]} clip ${i + 1}`}>
                      {/* eslint-disable-next-line @next/next/no-img-element -- a presigned redirect, not a static asset */}
                      <img src={`/api/clips/${c.id}/media/poster`} alt="" className="aspect-video w-full object-cover" loading="lazy" />
                      <span className="block bg-white px-2 py-2 text-label">{viewWords[c.view]} {i + 1}{c.mishitReason !== null && <span className="text-slate-600"> · set aside: {c.mishitReason}</span>}</span>
                    </Link>
                  ) : (
                    <span className="block rounded-card border border-chalk-300 px-2 py-3 text-label text-slate-600">{viewWords[c.view]} · {stateWords[c.state]}</span>
                  )}
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ol>
  );
}
