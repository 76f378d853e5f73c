import type { Metadata } from "next";
import { requirePageActor } from "@/lib/server/page-actor";
import { listStudioFittingsBetween } from "@/lib/server/dal/fittings";
import { listGolfers } from "@/lib/server/dal/golfers";
import { listClipsNeedingMarks } from "@/lib/server/dal/studio";
import { GolferList } from "@/components/studio/golfer-list";
import { TodayList } from "@/components/studio/today-list";
import { ClipsToMark } from "@/components/studio/clips-to-mark";
import { UnreadSummary } from "@/components/comments/unread-summary";
import { CoachFittings } from "@/components/phone/coach-fittings";

export const metadata: Metadata = { title: "Studio" };

export default async function StudioHome() {
  const actor = await requirePageActor();
  const staff = actor.role === "admin" || actor.role === "fitter";
  const start = new Date();
  start.setHours(0, 0, 0, 0);
  const end = new Date(start.getTime() + 24 * 3600 * 1000);
  const [today, toMark, golfers] = await Promise.all([
    staff ? listStudioFittingsBetween(actor, start, end) : Promise.resolve([]),
    staff ? listClipsNeedingMarks(actor) : Promise.resolve([]),
    listGolfers(actor, { limit: 10, offset: 0 }),
  ]);
  return (
    <div className="grid gap-6 lg:grid-cols-3">
      <h1 className="text-title lg:col-span-3">{staff ? "Today in the studio" : "Golfers shared with you"}</h1>
      {staff && <TodayList items={today} />}
      {staff && <ClipsToMark items={toMark} />}
      {actor.role !== "golfer" && <UnreadSummary actor={actor} />}
      {actor.role === "coach" && <CoachFittings actor={actor} />}
      <GolferList golfers={golfers.golfers} total={golfers.total} />
    </div>
  );
}
