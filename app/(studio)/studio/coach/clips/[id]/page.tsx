import type { Metadata } from "next";
import { PhoneClipPage } from "@/components/phone/phone-clip-page";
import { requirePageActor } from "@/lib/server/page-actor";
import { getPhoneClip, pageOr404 } from "@/lib/server/dal/golfer-clips";

export const metadata: Metadata = { title: "Clip" };

// The coach's clip page: the same read-only player as the golfer's, with comments.
export default async function CoachClipPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const data = await pageOr404((await params).id, (id) => getPhoneClip(actor, id));
  return <PhoneClipPage data={data} actor={actor} back={{ href: `/studio/coach/fittings/${data.clip.fittingId}`, label: "Fitting" }} />;
}
