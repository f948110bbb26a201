"use client";

/** Small inputs bound to the wizard's form by path, with the field's error beside it. */
import { get, useFormContext, type FieldErrors, type FieldPath } from "react-hook-form";
import { FieldError } from "@/app/_components/form";
import type { Content } from "@/assessments/method-statement/content";

/** The error message at a dotted path ("tasks.0.niosh.origin.h"), read with react-hook-form's own helper. */
export const errorAt = (errors: FieldErrors, path: string): string | undefined => (get(errors, path) as { message?: string } | undefined)?.message;

const inputClass = (error?: string) => `mt-1 block w-full rounded border bg-white px-2 py-1.5 ${error ? "border-danger" : "border-rule"}`;

export function Num({ name, label, unit, optional = false, step = "any" }: { name: FieldPath<Content>; label: string; unit?: string; optional?: boolean; step?: string }) {
  const { register, formState } = useFormContext<Content>();
  const error = errorAt(formState.errors, name);
  const id = `f-${name}`;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold">
        {label}
        {unit && <span className="font-normal text-muted"> ({unit})</span>}
      </label>
      <input
        id={id}
        type="number"
        inputMode="decimal"
        step={step}
        aria-invalid={error ? true : undefined}
        className={inputClass(error)}
        {...register(name, { setValueAs: (v: string | number) => (v === "" || v === null ? (optional ? undefined : Number.NaN) : Number(v)) })}
      />
      <FieldError compact message={error} />
    </div>
  );
}

export function Text({ name, label, area = false, hint }: { name: FieldPath<Content>; label: string; area?: boolean; hint?: string }) {
  const { register, formState } = useFormContext<Content>();
  const error = errorAt(formState.errors, name);
  const id = `f-${name}`;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold">
        {label}
      </label>
      {hint && <p className="text-xs text-muted">{hint}</p>}
      {area ? <textarea id={id} rows={4} className={inputClass(error)} aria-invalid={error ? true : undefined} {...register(name)} /> : <input id={id} className={inputClass(error)} aria-invalid={error ? true : undefined} {...register(name)} />}
      <FieldError compact message={error} />
    </div>
  );
}

export function Choice({ name, label, options, asNumber = false }: { name: FieldPath<Content>; label: string; options: readonly (readonly [string | number, string])[]; asNumber?: boolean }) {
  const { register, formState } = useFormContext<Content>();
  const error = errorAt(formState.errors, name);
  const id = `f-${name}`;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold">
        {label}
      </label>
      <select id={id} className={inputClass(error)} {...register(name, asNumber ? { valueAsNumber: true } : undefined)}>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      <FieldError compact message={error} />
    </div>
  );
}

export function Check({ name, label }: { name: FieldPath<Content>; label: string }) {
  const { register } = useFormContext<Content>();
  return (
    <label className="flex items-center gap-2 text-sm font-bold">
      <input type="checkbox" className="h-5 w-5" {...register(name)} />
      {label}
    </label>
  );
}
