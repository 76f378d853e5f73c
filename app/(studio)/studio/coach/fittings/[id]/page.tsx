import type { Metadata } from "next";
import Link from "next/link";
import { FittingClips } from "@/components/phone/fitting-clips";
import { requirePageActor } from "@/lib/server/page-actor";
import { getPhoneFitting, pageOr404 } from "@/lib/server/dal/golfer-clips";

export const metadata: Metadata = { title: "Fitting clips" };

// A fitting's clips for a coach (read-only; each opens the coach's clip page).
export default async function CoachFittingPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const data = await pageOr404((await params).id, (id) => getPhoneFitting(actor, id));
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4">
      <p className="text-label text-slate-600"><Link href={`/studio/golfers/${data.fitting.golferId}`} className="inline-flex min-h-touch items-center">← Golfer</Link></p>
      <h1 className="text-title">Fitting clips</h1>
      <FittingClips data={data} clipHref={(id) => `/studio/coach/clips/${id}`} />
    </div>
  );
}
