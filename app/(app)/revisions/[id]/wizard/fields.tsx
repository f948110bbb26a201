"use client";

/** Small inputs bound to the wizard's form by path, with the field's error beside it. */
import { get, useFormContext, type FieldErrors, type FieldPath } from "react-hook-form";
import { controlClass, controlProps, FieldFrame, withUnit } from "@/app/_components/form";
import type { Content } from "@/assessments/method-statement/content";

/** The error message at a dotted path ("tasks.0.niosh.origin.h"), read with react-hook-form's own helper. */
export const errorAt = (errors: FieldErrors, path: string): string | undefined => (get(errors, path) as { message?: string } | undefined)?.message;

/** The form's register, the field's error and an id for its label, for a field of the content. */
function useContentField(name: FieldPath<Content>) {
  const { register, formState } = useFormContext<Content>();
  const error = errorAt(formState.errors, name);
  const id = `f-${name}`;
  return { register, error, id, control: { ...controlProps(id, error), className: controlClass(error, true) } };
}

export function Num({ name, label, unit, optional = false, step = "any" }: { name: FieldPath<Content>; label: string; unit?: string; optional?: boolean; step?: string }) {
  const { register, error, id, control } = useContentField(name);
  return (
    <FieldFrame id={id} label={withUnit(label, unit)} error={error} compact>
      <input
        type="number"
        inputMode="decimal"
        step={step}
        {...control}
        {...register(name, { setValueAs: (v: string | number) => (v === "" || v === null ? (optional ? undefined : Number.NaN) : Number(v)) })}
      />
    </FieldFrame>
  );
}

export function Text({ name, label, area = false, hint }: { name: FieldPath<Content>; label: string; area?: boolean; hint?: string }) {
  const { register, error, id, control } = useContentField(name);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} compact>
      {area ? <textarea rows={4} {...control} {...register(name)} /> : <input {...control} {...register(name)} />}
    </FieldFrame>
  );
}

export function Choice({ name, label, options, asNumber = false }: { name: FieldPath<Content>; label: string; options: readonly (readonly [string | number, string])[]; asNumber?: boolean }) {
  const { register, error, id, control } = useContentField(name);
  return (
    <FieldFrame id={id} label={label} error={error} compact>
      <select {...control} {...register(name, asNumber ? { valueAsNumber: true } : undefined)}>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
    </FieldFrame>
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
