"use client";
// Studio settings (admin): measurement windows, distance units, friction μ, capture rate per view.
import { useState } from "react";
import { useForm, type FieldPath } from "react-hook-form";
import { ApiClientError, apiFetch } from "@/lib/client/api";
import { studioSettingsSchema, type StudioSettingsInput } from "@/lib/schemas/settings";
import { FormField } from "@/components/golfers/form-field";

type Metric = { key: string; label: string; unit: string };
type WindowRow = { min: string; max: string };
type FormValues = Omit<StudioSettingsInput, "windows"> & { windowRows: Record<string, WindowRow> };

const VIEWS = ["overhead", "face-on", "down-the-line"] as const;

export function SettingsForm({ initial, metrics }: { initial: StudioSettingsInput; metrics: Metric[] }) {
  const [status, setStatus] = useState<string | null>(null);
  const [windowErrors, setWindowErrors] = useState<Record<string, string>>({});
  const rows = Object.fromEntries(metrics.map((m) => [m.key, { min: initial.windows[m.key]?.min?.toString() ?? "", max: initial.windows[m.key]?.max?.toString() ?? "" }]));
  const { register, handleSubmit, setError, formState } = useForm<FormValues>({
    defaultValues: { units: initial.units, speedUnit: initial.speedUnit ?? "m/s", frictionMu: initial.frictionMu, cameraFps: initial.cameraFps, windowRows: rows },
  });
  const onSubmit = handleSubmit(async ({ windowRows, ...rest }) => {
    setStatus(null);
    const windows: StudioSettingsInput["windows"] = {};
    for (const [key, r] of Object.entries(windowRows)) if (r.min !== "" || r.max !== "") windows[key] = { min: Number(r.min), max: Number(r.max) };
    const parsed = studioSettingsSchema.safeParse({ ...rest, windows });
    const errs: Record<string, string> = {};
    if (!parsed.success) {
      for (const i of parsed.error.issues) {
        if (i.path[0] === "windows") errs[String(i.path[1])] = i.message;
        else setError(i.path.join(".") as FieldPath<FormValues>, { message: i.message });
      }
      setWindowErrors(errs);
      setStatus("Not saved: check the marked fields.");
      return;
    }
    setWindowErrors({});
    try {
      await apiFetch("/api/studio/settings", { method: "PUT", body: parsed.data });
      setStatus("Saved.");
    } catch (e) {
      setStatus(e instanceof ApiClientError ? `Not saved: ${e.message}` : "Not saved.");
    }
  });
  const num = { setValueAs: (v: unknown) => (v === "" ? Number.NaN : Number(v)) };
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-title">Units and green</legend>
        <div>
          <label htmlFor="units" className="field-label">Distances in</label>
          <select id="units" className="field" {...register("units")}><option value="ft">feet</option><option value="m">metres</option></select>
        </div>
        <div>
          <label htmlFor="speedUnit" className="field-label">Speeds in</label>
          <select id="speedUnit" className="field" {...register("speedUnit")}><option value="m/s">m/s</option><option value="ft/s">ft/s</option><option value="mph">mph</option></select>
        </div>
        <FormField id="frictionMu" label={<>Sliding friction <span className="normal-case">μ</span> (ball on green)</>} type="number" step={0.01} hint="No agreed published value: set what suits your surface." error={formState.errors.frictionMu?.message} {...register("frictionMu", num)} />
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-title">Camera capture rate (frames per second)</legend>
        {VIEWS.map((v) => (
          <FormField key={v} id={`fps-${v}`} label={v} type="number" step={1} error={formState.errors.cameraFps?.[v]?.message} {...register(`cameraFps.${v}`, num)} />
        ))}
      </fieldset>
      <fieldset>
        <legend className="mb-2 text-title">Measurement windows</legend>
        <p className="mb-3 text-label text-slate-600">
          A window is a range, from one end to the other. A measurement inside it reads &ldquo;in window&rdquo;; one whose uncertainty (its ±) is
          wider than half the window reads &ldquo;undecided&rdquo;. Leave both ends empty for no window.
        </p>
        <table className="num text-left">
          <thead className="text-label uppercase text-slate-600"><tr><th className="pr-4">Measurement</th><th className="pr-4">from</th><th className="pr-4">to</th></tr></thead>
          <tbody>
            {metrics.map((m) => (
              <tr key={m.key}>
                <th scope="row" className="pr-4 font-normal">{m.label} <span className="text-slate-600">({m.unit})</span></th>
                <td className="pr-4"><input aria-label={`${m.label} from`} className="field w-24" type="number" step="any" {...register(`windowRows.${m.key}.min`)} aria-describedby={windowErrors[m.key] ? `w-${m.key}-error` : undefined} /></td>
                <td className="pr-4"><input aria-label={`${m.label} to`} className="field w-24" type="number" step="any" {...register(`windowRows.${m.key}.max`)} aria-describedby={windowErrors[m.key] ? `w-${m.key}-error` : undefined} /></td>
                <td>{windowErrors[m.key] && <span id={`w-${m.key}-error`} className="field-error">{windowErrors[m.key]}</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </fieldset>
      <div className="flex items-center gap-4">
        <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>Save settings</button>
        {status && <p role="status" className={status.startsWith("Not") ? "field-error" : "text-slate-600"}>{status}</p>}
      </div>
    </form>
  );
}
