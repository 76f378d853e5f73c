import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SettingsForm } from "@/components/settings/settings-form";
import { METRIC_DEFINITIONS } from "@/lib/compare/metric-labels";
import { requirePageActor } from "@/lib/server/page-actor";
import { getStudioSettings } from "@/lib/server/dal/settings";

export const metadata: Metadata = { title: "Studio settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  if (actor.role !== "admin") notFound();
  const settings = await getStudioSettings(actor);
  const metrics = METRIC_DEFINITIONS.filter((m) => m.unit !== "").map(({ key, label, unit }) => ({ key, label, unit }));
  return (
    <div className="card">
      <h1 className="mb-4 text-title">Studio settings</h1>
      <SettingsForm initial={settings} metrics={metrics} />
    </div>
  );
}
