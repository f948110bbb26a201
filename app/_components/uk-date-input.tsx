"use client";

import { forwardRef, useState } from "react";
import { parseUkDate, ukDate } from "@/lib/dates";

type Props = Omit<React.InputHTMLAttributes<HTMLInputElement>, "value" | "onChange" | "type" | "min" | "max"> & {
  /** YYYY-MM-DD, "" for none, or the text as typed while it is not yet a date. */
  value: string;
  onChange: (value: string) => void;
};

const ISO = /^\d{4}-\d{2}-\d{2}$/;

/**
 * A date typed day-month-year, whatever language the browser is set to (a browser's own date picker
 * follows the phone's settings, and a US-set phone would ask month first). The form keeps YYYY-MM-DD;
 * text that is not a real date is passed on as typed, so the form's schema names the problem.
 */
export const UkDateInput = forwardRef<HTMLInputElement, Props>(function UkDateInput(
  { value, onChange, onBlur, ...rest },
  ref,
) {
  const [text, setText] = useState(() => (ISO.test(value) ? ukDate(value) : value));
  // Set from outside (a reset, a saved draft): show that date, day first.
  const shown = ISO.test(value) && parseUkDate(text) !== value ? ukDate(value) : text;
  return (
    <input
      ref={ref}
      type="text"
      inputMode="numeric"
      autoComplete="off"
      placeholder="DD-MM-YYYY"
      {...rest}
      value={shown}
      onChange={(e) => {
        setText(e.target.value);
        onChange(e.target.value.trim() === "" ? "" : (parseUkDate(e.target.value) ?? e.target.value.trim()));
      }}
      onBlur={(e) => {
        if (ISO.test(value)) setText(ukDate(value));
        onBlur?.(e);
      }}
    />
  );
});
