"use client";
// A labelled input whose error text is tied to it (aria-describedby, aria-invalid).
import type { InputHTMLAttributes, ReactNode } from "react";

type Props = InputHTMLAttributes<HTMLInputElement> & { id: string; label: ReactNode; error?: string; hint?: ReactNode };

export function FormField({ id, label, error, hint, className, ...input }: Props) {
  const described = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">{label}</label>
      <input id={id} className="field" aria-invalid={error ? true : undefined} aria-describedby={described} {...input} />
      {hint && <p id={`${id}-hint`} className="mt-1 text-label text-slate-600">{hint}</p>}
      {error && <p id={`${id}-error`} className="field-error">{error}</p>}
    </div>
  );
}

/** For number inputs: an empty box means "not given", anything else is read as a number. */
export const asOptionalNumber = (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v));
export const asOptionalText = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
