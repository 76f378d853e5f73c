"use client";
// The admin's booking settings, section by section; each section saves on its own.
import { ClosedDaysForm } from "./closed-days-form";
import { FittingTypesForm } from "./fitting-types-form";
import { useSave } from "./use-save";
import { WeeklyHoursForm } from "./weekly-hours-form";

export type Setup = {
  studio: { cancelNoticeHours: number; currency: string; timeZone: string };
  fittingTypes: { id: string; name: string; durationMin: number; bufferMin: number; feeMinor: number; active: boolean }[];
  rules: { fitterUserId: string; weekday: number; startMinute: number; endMinute: number }[];
  closedDays: { id: string; day: string; fitterUserId: string | null; reason: string }[];
  fitters: { id: string; name: string }[];
};

export function AvailabilityEditor({ setup }: { setup: Setup }) {
  const notice = useSave();
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <FittingTypesForm types={setup.fittingTypes} currency={setup.studio.currency} />
      <section className="card" aria-labelledby="notice-heading">
        <h2 id="notice-heading" className="field-label">Notice rule</h2>
        <form className="flex items-end gap-3" onSubmit={(e) => {
          e.preventDefault();
          void notice.save("/api/booking/settings", "PATCH", { cancelNoticeHours: Number(new FormData(e.currentTarget).get("hours")) });
        }}>
          <div>
            <label htmlFor="notice-hours" className="field-label">Hours of notice to cancel with a refund or move a visit</label>
            <input id="notice-hours" name="hours" type="number" min={0} max={720} defaultValue={setup.studio.cancelNoticeHours} className="field num" />
          </div>
          <button className="btn-primary" disabled={notice.pending}>Save</button>
        </form>
        {notice.error && <p role="alert" className="field-error">{notice.error}</p>}
      </section>
      {setup.fitters.map((f) => (
        <WeeklyHoursForm key={f.id} fitter={f} rules={setup.rules.filter((r) => r.fitterUserId === f.id)} />
      ))}
      <ClosedDaysForm days={setup.closedDays} fitters={setup.fitters} />
    </div>
  );
}
