"use client";
// New golfer and intake: one form, validated in the browser and on the server by the same schema.
// A failed submit keeps every value; the server's field errors land on their inputs.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type FieldPath } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { ApiClientError, apiFetch } from "@/lib/client/api";
import { golferCreateSchema, PUTTING_STYLES, USUAL_MISSES } from "@/lib/schemas/golfer";
import { asOptionalNumber, asOptionalText, FormField } from "./form-field";

type Input = z.input<typeof golferCreateSchema>;
type Output = z.output<typeof golferCreateSchema>;

export function IntakeForm({ golferId, initial }: { golferId?: string; initial?: Input }) {
  const router = useRouter();
  const [status, setStatus] = useState<string | null>(null);
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(golferCreateSchema),
    defaultValues: initial ?? { name: "", handedness: "right", isMinor: false, intake: {}, consent: { given: false, by: "golfer" } },
    mode: "onTouched",
  });
  const { register, handleSubmit, control, setError, formState } = form;
  const err = (path: FieldPath<Input>) => path.split(".").reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], formState.errors) as { message?: string } | undefined;
  const [isMinor, consentGiven, consentBy] = useWatch({ control, name: ["isMinor", "consent.given", "consent.by"] });

  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    try {
      const saved = await apiFetch<{ id: string }>(golferId ? `/api/golfers/${golferId}` : "/api/golfers", { method: golferId ? "PATCH" : "POST", body: values });
      if (golferId) {
        setStatus("Saved.");
        router.refresh();
      } else router.push(`/studio/golfers/${saved.id}`);
    } catch (e) {
      if (e instanceof ApiClientError && e.issues) for (const i of e.issues) setError(i.path as FieldPath<Input>, { message: i.message });
      setStatus(e instanceof Error ? `Not saved: ${e.message}` : "Not saved.");
    }
  });

  const num = { setValueAs: asOptionalNumber };
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-title">Golfer</legend>
        <FormField id="name" label="Name" autoComplete="off" error={err("name")?.message} {...register("name")} />
        <FormField id="email" label="E-mail (for the spec and sign-in)" type="email" error={err("email")?.message} {...register("email", { setValueAs: asOptionalText })} />
        <div>
          <label htmlFor="handedness" className="field-label">Handedness</label>
          <select id="handedness" className="field" {...register("handedness")}>
            <option value="right">Right-handed</option>
            <option value="left">Left-handed</option>
          </select>
        </div>
        <label className="flex min-h-touch items-center gap-2 self-end">
          <input type="checkbox" {...register("isMinor")} /> Under 18 (a guardian gives consent)
        </label>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-title">Putting</legend>
        <FormField id="puttingStyle" label="Putting style" list="putting-styles" error={err("intake.puttingStyle")?.message} {...register("intake.puttingStyle")} />
        <datalist id="putting-styles">{PUTTING_STYLES.map((s) => <option key={s} value={s} />)}</datalist>
        <FormField id="usualMiss" label="Usual miss" list="usual-misses" error={err("intake.usualMiss")?.message} {...register("intake.usualMiss")} />
        <datalist id="usual-misses">{USUAL_MISSES.map((s) => <option key={s} value={s} />)}</datalist>
        <FormField id="ball" label="Ball" error={err("intake.ball")?.message} {...register("intake.ball")} />
        <FormField id="greenSpeedFt" label="Green speed at home (ft)" inputMode="decimal" hint="The reading in feet (Stimpmeter)" error={err("intake.greenSpeedFt")?.message} {...register("intake.greenSpeedFt", num)} />
        <FormField id="heightCm" label="Height (cm)" inputMode="decimal" error={err("intake.heightCm")?.message} {...register("intake.heightCm", num)} />
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-title">Current putter</legend>
        <FormField id="cpHead" label="Head style" error={err("intake.currentPutter.headStyle")?.message} {...register("intake.currentPutter.headStyle")} />
        <FormField id="cpLength" label="Length (in)" inputMode="decimal" error={err("intake.currentPutter.lengthIn")?.message} {...register("intake.currentPutter.lengthIn", num)} />
        <FormField id="cpLie" label="Lie (°)" inputMode="decimal" error={err("intake.currentPutter.lieDeg")?.message} {...register("intake.currentPutter.lieDeg", num)} />
        <FormField id="cpLoft" label="Loft (°)" inputMode="decimal" error={err("intake.currentPutter.loftDeg")?.message} {...register("intake.currentPutter.loftDeg", num)} />
        <FormField id="cpGrip" label="Grip" error={err("intake.currentPutter.grip")?.message} {...register("intake.currentPutter.grip")} />
      </fieldset>

      <div>
        <label htmlFor="notes" className="field-label">Notes</label>
        <textarea id="notes" rows={3} className="field" aria-describedby={err("intake.notes") ? "notes-error" : undefined} {...register("intake.notes")} />
        {err("intake.notes") && <p id="notes-error" className="field-error">{err("intake.notes")?.message}</p>}
      </div>

      <fieldset className="flex flex-col gap-3 rounded-card border border-chalk-300 p-4">
        <legend className="px-1 text-title">Consent to video</legend>
        <p className="text-label text-slate-600">Clips show the golfer: they are personal data, kept private, and recorded only with consent — a guardian&apos;s for a minor.</p>
        <label className="flex min-h-touch items-center gap-2">
          <input type="checkbox" {...register("consent.given")} /> Consent to record video has been given
        </label>
        {consentGiven && (
          <div className="grid gap-4 sm:grid-cols-2">
            <div>
              <label htmlFor="consentBy" className="field-label">Given by</label>
              <select id="consentBy" className="field" aria-describedby={err("consent.by") ? "consentBy-error" : undefined} {...register("consent.by")}>
                <option value="golfer">The golfer</option>
                <option value="guardian">A parent or guardian</option>
              </select>
              {err("consent.by") && <p id="consentBy-error" className="field-error">{err("consent.by")?.message}</p>}
            </div>
            {(isMinor || consentBy === "guardian") && (
              <FormField id="guardianName" label="Guardian's name" error={err("consent.guardianName")?.message} {...register("consent.guardianName", { setValueAs: asOptionalText })} />
            )}
          </div>
        )}
      </fieldset>

      <div className="flex items-center gap-4">
        <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>{golferId ? "Save intake" : "Add golfer"}</button>
        {status && <p role="status" className={status.startsWith("Not") ? "field-error" : "text-slate-600"}>{status}</p>}
      </div>
    </form>
  );
}
