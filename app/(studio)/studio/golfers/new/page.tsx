import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { IntakeForm } from "@/components/golfers/intake-form";
import { requirePageActor } from "@/lib/server/page-actor";

export const metadata: Metadata = { title: "Add golfer" };

export default async function NewGolferPage() {
  const actor = await requirePageActor();
  if (actor.role !== "admin" && actor.role !== "fitter") notFound();
  return (
    <div className="card">
      <h1 className="mb-4 text-title">Add a golfer</h1>
      <IntakeForm />
    </div>
  );
}
