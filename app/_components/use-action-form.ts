"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import type { ActionResult } from "@/lib/actions";

/**
 * A react-hook-form form checked by the same zod schema as its server action: the action's field
 * issues land on their fields, anything else in `outcome` beside the form.
 */
export function useActionForm<Values extends FieldValues, Data = unknown>(
  schema: z.ZodType<unknown, Values>,
  action: (values: Values) => Promise<ActionResult<Data>>,
  {
    defaultValues,
    onSuccess,
  }: { defaultValues?: DefaultValues<Values>; onSuccess?: (result: { message?: string; data?: Data }) => void } = {},
) {
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema as never) as never, defaultValues });
  const onSubmit = form.handleSubmit(async (values) => {
    setOutcome(null);
    const result = await action(values);
    if (result.ok) {
      if (result.message) setOutcome({ tone: "success", text: result.message });
      onSuccess?.(result);
      return;
    }
    for (const issue of result.issues ?? []) form.setError(issue.path as Path<Values>, { message: issue.message });
    setOutcome({ tone: "error", text: result.message });
  });
  return { ...form, onSubmit, outcome, setOutcome };
}
