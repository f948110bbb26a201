"use client";

/** Small inputs bound to the wizard's form by path, with the field's error beside it. */
import { useState } from "react";
import { Controller, get, useFormContext, type FieldErrors, type FieldPath } from "react-hook-form";
import { UkDateInput } from "@/app/_components/uk-date-input";
import { controlClass, controlProps, FieldError, FieldFrame, withUnit } from "@/app/_components/form";
import type { Content } from "@/assessments/method-statement/content";

/** The error message at a dotted path ("tasks.0.niosh.origin.h"), read with react-hook-form's own helper. */
export const errorAt = (errors: FieldErrors, path: string): string | undefined =>
  (get(errors, path) as { message?: string } | undefined)?.message;

/** The form's register, the field's error and an id for its label, for a field of the content. */
function useContentField(name: FieldPath<Content>) {
  const { register, formState } = useFormContext<Content>();
  const error = errorAt(formState.errors, name);
  const id = `f-${name}`;
  return { register, error, id, control: { ...controlProps(id, error), className: controlClass(error, true) } };
}

export function Num({
  name,
  label,
  unit,
  optional = false,
  step = "any",
}: {
  name: FieldPath<Content>;
  label: string;
  unit?: string;
  optional?: boolean;
  step?: string;
}) {
  const { register, error, id, control } = useContentField(name);
  return (
    <FieldFrame id={id} label={withUnit(label, unit)} error={error} compact>
      <input
        type="number"
        inputMode="decimal"
        step={step}
        {...control}
        {...register(name, {
          setValueAs: (v: string | number) =>
            v === "" || v === null ? (optional ? undefined : Number.NaN) : Number(v),
        })}
      />
    </FieldFrame>
  );
}

export function Text({
  name,
  label,
  area = false,
  hint,
}: {
  name: FieldPath<Content>;
  label: string;
  area?: boolean;
  hint?: string;
}) {
  const { register, error, id, control } = useContentField(name);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} compact>
      {area ? <textarea rows={4} {...control} {...register(name)} /> : <input {...control} {...register(name)} />}
    </FieldFrame>
  );
}

/**
 * A select bound to the content. With `placeholder`, a blank first option stores null (an
 * arrangement not yet chosen); `asNumber` stores numbers.
 */
export function Choice({
  name,
  label,
  options,
  asNumber = false,
  placeholder,
}: {
  name: FieldPath<Content>;
  label: string;
  options: readonly (readonly [string | number, string])[];
  asNumber?: boolean;
  placeholder?: string;
}) {
  const { register, error, id, control } = useContentField(name);
  const as = asNumber
    ? { valueAsNumber: true as const }
    : placeholder !== undefined
      ? { setValueAs: (v: string | null) => (v === "" || v === null ? null : v) }
      : undefined;
  return (
    <FieldFrame id={id} label={label} error={error} compact>
      <select {...control} {...register(name, as)}>
        {placeholder !== undefined && <option value="">{placeholder}</option>}
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

type Direction = "level" | "up" | "down";
type GradientForm = "ratio" | "percent";

/** Rise ÷ run from what was typed: "1 in N" or a percentage, and the direction of travel; or why not. */
export function parseGradient(
  direction: Direction,
  form: GradientForm,
  typed: string,
): { gradient: number } | { error: string } {
  if (direction === "level") return { gradient: 0 };
  const n = Number(typed.trim().replace(/^1\s*in\s*/i, ""));
  if (typed.trim() === "" || !Number.isFinite(n))
    return { error: form === "ratio" ? "Enter N of 1 in N" : "Enter the gradient in %" };
  if (form === "ratio" && n < 1) return { error: "1 in N needs N of 1 or more (1 in 1 is 45°)" };
  if (form === "percent" && (n <= 0 || n > 100)) return { error: "A gradient in % is above 0 and at most 100" };
  const rise = form === "ratio" ? 1 / n : n / 100;
  return { gradient: direction === "down" ? -rise : rise };
}

/**
 * A gradient along the direction of travel, typed as railway practice quotes it ("1 in 60") or as a
 * percentage, uphill or downhill; stored as rise ÷ run (negative downhill). A value that makes no
 * gradient (1 in 0) gets its message here and stores nothing the engine would score.
 */
export function GradientField({ name, label }: { name: FieldPath<Content>; label: string }) {
  const { setValue, getValues, formState } = useFormContext<Content>();
  const stored = Number(getValues(name)) || 0;
  const [direction, setDirection] = useState<Direction>(stored > 0 ? "up" : stored < 0 ? "down" : "level");
  const [form, setForm] = useState<GradientForm>("ratio");
  const [typed, setTyped] = useState(stored ? String(Math.round((1 / Math.abs(stored)) * 10) / 10) : "");
  const parsed = parseGradient(direction, form, typed);
  const error = "error" in parsed ? parsed.error : errorAt(formState.errors, name);
  const id = `f-${name}`;
  const update = (d: Direction, f: GradientForm, t: string) => {
    setDirection(d);
    setForm(f);
    setTyped(t);
    const next = parseGradient(d, f, t);
    setValue(name, ("gradient" in next ? next.gradient : Number.NaN) as never, {
      shouldValidate: true,
      shouldDirty: true,
    });
  };
  const g = "gradient" in parsed ? parsed.gradient : null;
  return (
    <fieldset className="col-span-2 sm:col-span-3">
      <legend className="text-sm font-bold">{label}</legend>
      <div className="mt-1 flex flex-wrap items-center gap-2">
        <select
          aria-label="Direction of travel"
          className={controlClass(undefined, true) + " !mt-0 !w-auto"}
          value={direction}
          onChange={(e) => update(e.target.value as Direction, form, typed)}
        >
          <option value="level">Level</option>
          <option value="up">Uphill</option>
          <option value="down">Downhill</option>
        </select>
        {direction !== "level" && (
          <>
            {form === "ratio" && <span className="text-sm">1 in</span>}
            <input
              inputMode="decimal"
              aria-label={form === "ratio" ? "N of 1 in N" : "Gradient in %"}
              {...controlProps(id, error)}
              className={controlClass(error, true) + " !mt-0 !w-24"}
              value={typed}
              onChange={(e) => update(direction, form, e.target.value)}
            />
            <select
              aria-label="Gradient given as"
              className={controlClass(undefined, true) + " !mt-0 !w-auto"}
              value={form}
              onChange={(e) => update(direction, e.target.value as GradientForm, typed)}
            >
              <option value="ratio">1 in N</option>
              <option value="percent">%</option>
            </select>
          </>
        )}
      </div>
      {g !== null && g !== 0 && (
        <p className="mt-0.5 text-xs text-muted" data-testid="gradient-reading">
          1 in {Math.round(1 / Math.abs(g))} ({(Math.abs(g) * 100).toFixed(2).replace(/\.?0+$/, "")} %){" "}
          {g < 0 ? "downhill" : "uphill"} in the direction of travel
        </p>
      )}
      <FieldError id={`${id}-error`} message={error} compact />
    </fieldset>
  );
}

/** A date typed day-month-year, kept as YYYY-MM-DD (or blank). */
export function DateField({ name, label }: { name: FieldPath<Content>; label: string }) {
  const { error, id, control } = useContentField(name);
  const form = useFormContext<Content>();
  return (
    <FieldFrame id={id} label={label} error={error} compact>
      <Controller
        control={form.control}
        name={name}
        render={({ field }) => (
          <UkDateInput
            {...control}
            name={field.name}
            ref={field.ref}
            value={typeof field.value === "string" ? field.value : ""}
            onChange={field.onChange}
            onBlur={field.onBlur}
          />
        )}
      />
    </FieldFrame>
  );
}
