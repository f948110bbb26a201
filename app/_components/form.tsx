/** Form parts shared by every Heftwise form: a labelled field with its error, and buttons. */
import { forwardRef } from "react";

export function FieldError({ id, message, compact = false }: { id?: string; message?: string; compact?: boolean }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className={`font-bold text-danger ${compact ? "mt-0.5 text-xs" : "mt-1 text-sm"}`}>
      {message}
    </p>
  );
}

/** Props that tie a control to its label and to its error message. */
export const controlProps = (id: string, error?: string) => ({
  id,
  "aria-invalid": error ? true : undefined,
  "aria-describedby": error ? `${id}-error` : undefined,
});

/** A field's frame: label, optional hint, the control, and its error below. */
export function FieldFrame({
  id,
  label,
  hint,
  error,
  compact = false,
  children,
}: {
  id: string;
  label: React.ReactNode;
  hint?: string;
  error?: string;
  compact?: boolean;
  children: React.ReactNode;
}) {
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold">
        {label}
      </label>
      {hint && <p className="text-xs text-muted">{hint}</p>}
      {children}
      <FieldError id={`${id}-error`} message={error} compact={compact} />
    </div>
  );
}

/** The look of an input or select; compact for the dense forms of the wizard and lift plan. */
export const controlClass = (error?: string, compact = false) =>
  `mt-1 block w-full rounded border bg-white ${compact ? "px-2 py-1.5" : "px-3 py-2 text-base"} ${error ? "border-danger" : "border-rule"}`;

/** A label with its unit after it, in lighter type: "Radius (m)". */
export function withUnit(label: string, unit?: string) {
  return (
    <>
      {label}
      {unit && <span className="font-normal text-muted"> ({unit})</span>}
    </>
  );
}

type InputProps = React.InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: string };

export const TextField = forwardRef<HTMLInputElement, InputProps>(function TextField(
  { label, error, hint, id, name, ...rest },
  ref,
) {
  const fieldId = id ?? `field-${name}`;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <input ref={ref} name={name} {...controlProps(fieldId, error)} className={controlClass(error)} {...rest} />
    </FieldFrame>
  );
});

type SelectProps = React.SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string };

export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField(
  { label, error, id, name, children, ...rest },
  ref,
) {
  const fieldId = id ?? `field-${name}`;
  return (
    <FieldFrame id={fieldId} label={label} error={error}>
      <select ref={ref} name={name} {...controlProps(fieldId, error)} className={controlClass(error)} {...rest}>
        {children}
      </select>
    </FieldFrame>
  );
});

export function PrimaryButton({ className = "", ...rest }: React.ButtonHTMLAttributes<HTMLButtonElement>) {
  return (
    <button
      className={`rounded bg-accent px-4 py-2 font-bold text-white hover:brightness-110 disabled:opacity-60 ${className}`}
      {...rest}
    />
  );
}

export function SecondaryButton({ className = "", ...rest }: React.ButtonHTMLAttributes<HTMLButtonElement>) {
  return (
    <button
      className={`rounded border border-rule bg-white px-3 py-1.5 font-bold hover:bg-paper disabled:opacity-60 ${className}`}
      {...rest}
    />
  );
}

export function FormMessage({ tone, children }: { tone: "error" | "success"; children: React.ReactNode }) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={`rounded border-l-4 px-3 py-2 text-sm ${tone === "error" ? "border-danger bg-red-50 text-danger" : "border-accent bg-teal-50 text-ink"}`}
    >
      {children}
    </div>
  );
}
