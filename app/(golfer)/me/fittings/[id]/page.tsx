import type { Metadata } from "next";
import Link from "next/link";
import { FittingClips } from "@/components/phone/fitting-clips";
import { requirePageActor } from "@/lib/server/page-actor";
import { getPhoneFitting, pageOr404 } from "@/lib/server/dal/golfer-clips";

export const metadata: Metadata = { title: "Fitting" };

export default async function GolferFittingPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const data = await pageOr404((await params).id, (id) => getPhoneFitting(actor, id));
  const day = data.fitting.scheduledAt.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-4 p-4">
      <p className="text-label text-slate-600"><Link href="/me" className="inline-flex min-h-touch items-center">← My fittings</Link></p>
      <h1 className="text-title">Fitting of <span className="num">{day}</span></h1>
      {data.builds.length > 1 && <Link href={`/me/fittings/${data.fitting.id}/compare`} className="btn-quiet">Compare two putters side by side</Link>}
      <FittingClips data={data} clipHref={(id) => `/me/clips/${id}`} />
    </main>
  );
}
