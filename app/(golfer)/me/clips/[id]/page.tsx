import type { Metadata } from "next";
import { PhoneClipPage } from "@/components/phone/phone-clip-page";
import { requirePageActor } from "@/lib/server/page-actor";
import { getPhoneClip, pageOr404 } from "@/lib/server/dal/golfer-clips";

export const metadata: Metadata = { title: "Clip" };

export default async function GolferClipPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const data = await pageOr404((await params).id, (id) => getPhoneClip(actor, id));
  return (
    <main className="p-4">
      <PhoneClipPage data={data} actor={actor} back={{ href: `/me/fittings/${data.clip.fittingId}`, label: "Fitting" }} />
    </main>
  );
}
