"use client";
// A labelled select whose error text is tied to it: the select twin of FormField.
import type { SelectHTMLAttributes } from "react";

type Props = SelectHTMLAttributes<HTMLSelectElement> & { id: string; label: string; error?: string; options: readonly { value: string; label: string }[] };

export function ChoiceField({ id, label, error, options, className, ...select }: Props) {
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">{label}</label>
      <select id={id} className="field" aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined} {...select}>
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
      {error && <p id={`${id}-error`} className="field-error">{error}</p>}
    </div>
  );
}
