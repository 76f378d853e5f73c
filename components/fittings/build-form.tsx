"use client";
// Adds a build to the fitting. Units: length in inches to 0.25, lie, loft and designed shaft lean in degrees
// to 0.5, grip width and gap in inches to 0.01, masses in grams. The two-grip fields show only for two grips.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type FieldPath } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { ApiClientError, apiFetch } from "@/lib/client/api";
import { buildFieldsSchema } from "@/lib/schemas/fitting";
import { FormField } from "@/components/golfers/form-field";
import { fieldsForGrips, fieldValue, isNumericField } from "./build-fields";
import { ChoiceField } from "./choice-field";

type Input = z.input<typeof buildFieldsSchema>;
type Output = z.output<typeof buildFieldsSchema>;

export function BuildForm({ fittingId, first }: { fittingId: string; first: boolean }) {
  const router = useRouter();
  const [status, setStatus] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, setValue, control, formState } = useForm<Input, unknown, Output>({
    resolver: zodResolver(buildFieldsSchema),
    defaultValues: { label: first ? "Own putter" : "", isBaseline: first },
  });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    try {
      const build = await apiFetch<{ label: string; warnings: { message: string }[] }>(`/api/fittings/${fittingId}/builds`, { method: "POST", body: values });
      // The other fields keep what was typed (the next build is usually a variant); the grip count is
      // set again so that the two-grip fields shown agree with the select.
      reset({ label: "", isBaseline: false });
      setValue("gripCount", values.gripCount ?? 1);
      setStatus(`Added ${build.label}.${build.warnings.length ? ` Check the equipment rules: ${build.warnings.map((w) => w.message).join(" ")}` : ""}`);
      router.refresh();
    } catch (e) {
      if (e instanceof ApiClientError && e.issues) for (const i of e.issues) setError(i.path as FieldPath<Input>, { message: i.message });
      setStatus(e instanceof Error ? `Not added: ${e.message}` : "Not added.");
    }
  });
  const gripCount = Number(useWatch({ control, name: "gripCount" }) ?? 1);
  const err = (k: string) => (formState.errors as Record<string, { message?: string } | undefined>)[k]?.message;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-3 lg:grid-cols-5">
        <FormField id="build-label" label="Name of the build" error={err("label")} {...register("label")} />
        {fieldsForGrips(gripCount).map((f) => {
          const label = f.unit ? `${f.label} (${f.unit})` : f.label;
          // Two-grip fields leave the form's values when they are hidden, so a gap never goes with one grip.
          const options = { shouldUnregister: f.twoGripsOnly, setValueAs: (v: unknown) => (f.choices || isNumericField(f) ? fieldValue(f, typeof v === "string" ? v : String(v ?? "")) : v) };
          return f.choices ? (
            <ChoiceField key={f.key} id={`build-${f.key}`} label={label} options={f.choices} error={err(f.key)} {...register(f.key, options)} />
          ) : (
            <FormField
              key={f.key}
              id={`build-${f.key}`}
              label={label}
              type={isNumericField(f) ? "number" : "text"}
              step={f.step}
              hint={f.hint}
              error={err(f.key)}
              {...register(f.key, options)}
            />
          );
        })}
      </div>
      <label className="flex min-h-touch items-center gap-2"><input type="checkbox" {...register("isBaseline")} /> The golfer&apos;s own putter (baseline)</label>
      <div className="flex items-center gap-4">
        <button type="submit" className="btn-primary" disabled={formState.isSubmitting}>Add build</button>
        {status && <p role="status" className="text-slate-600">{status}</p>}
      </div>
    </form>
  );
}
