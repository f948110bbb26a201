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

type InputProps = React.InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: string };

export const TextField = forwardRef<HTMLInputElement, InputProps>(function TextField({ label, error, hint, id, name, ...rest }, ref) {
  const fieldId = id ?? `field-${name}`;
  return (
    <div>
      <label htmlFor={fieldId} className="block text-sm font-bold">
        {label}
      </label>
      {hint && <p className="text-xs text-muted">{hint}</p>}
      <input
        ref={ref}
        id={fieldId}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className={`mt-1 block w-full rounded border bg-white px-3 py-2 text-base ${error ? "border-danger" : "border-rule"}`}
        {...rest}
      />
      <FieldError id={`${fieldId}-error`} message={error} />
    </div>
  );
});

type SelectProps = React.SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string };

export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField({ label, error, id, name, children, ...rest }, ref) {
  const fieldId = id ?? `field-${name}`;
  return (
    <div>
      <label htmlFor={fieldId} className="block text-sm font-bold">
        {label}
      </label>
      <select
        ref={ref}
        id={fieldId}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className={`mt-1 block w-full rounded border bg-white px-3 py-2 text-base ${error ? "border-danger" : "border-rule"}`}
        {...rest}
      >
        {children}
      </select>
      <FieldError id={`${fieldId}-error`} message={error} />
    </div>
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
  return <button className={`rounded border border-rule bg-white px-3 py-1.5 font-bold hover:bg-paper disabled:opacity-60 ${className}`} {...rest} />;
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
