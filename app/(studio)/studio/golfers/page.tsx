import type { Metadata } from "next";
import Link from "next/link";
import { GolferTable } from "@/components/golfers/golfer-table";
import { requirePageActor } from "@/lib/server/page-actor";

export const metadata: Metadata = { title: "Golfers" };

export default async function GolfersPage() {
  const actor = await requirePageActor();
  const staff = actor.role === "admin" || actor.role === "fitter";
  return (
    <div className="flex flex-col gap-4">
      <div className="flex items-center justify-between">
        <h1 className="text-title">Golfers</h1>
        {staff && <Link href="/studio/golfers/new" className="btn-primary">Add golfer</Link>}
      </div>
      <GolferTable />
    </div>
  );
}
