import type { Metadata } from "next";
import Link from "next/link";
import { CompareView } from "@/components/phone/compare-view";
import { requirePageActor } from "@/lib/server/page-actor";
import { getComparePair, pageOr404 } from "@/lib/server/dal/golfer-clips";

export const metadata: Metadata = { title: "Compare" };

type Search = Promise<{ a?: string; b?: string }>;

export default async function ComparePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Search }) {
  const actor = await requirePageActor();
  const { id } = await params;
  const pick = await searchParams;
  const { pair } = await pageOr404(id, (fittingId) => getComparePair(actor, fittingId, pick));
  const side = (s: NonNullable<typeof pair>["a"]) => ({
    clip: { id: s.clip.id, width: s.clip.width!, height: s.clip.height!, frameCount: s.clip.frameCount!, captureFps: s.clip.captureFps, slowMotionFactor: s.clip.slowMotionFactor, moments: s.clip.moments },
    marks: s.marks.map((m) => ({ id: m.id, frame: m.frame, kind: m.kind, role: m.role, points: m.points as [number, number][] })),
    buildLabel: s.buildLabel,
  });
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-4 p-4">
      <p className="text-label text-slate-600"><Link href={`/me/fittings/${id}`} className="inline-flex min-h-touch items-center">← Fitting</Link></p>
      <h1 className="text-title">Side by side at impact</h1>
      {pair ? <CompareView a={side(pair.a)} b={side(pair.b)} /> : <p className="card">Two ready clips with an impact frame are needed: one with your putter and one with the chosen build.</p>}
    </main>
  );
}
