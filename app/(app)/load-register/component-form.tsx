"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { FormMessage, PrimaryButton, SelectField, TextField } from "@/app/_components/form";
import { componentSchema, type ComponentInput } from "@/assessments/load-register/schemas";
import { saveComponentAction } from "./actions";

const optionalNumber = { setValueAs: (v: string | number) => (v === "" || v === null ? null : Number(v)) };

export function ComponentForm({ componentId, initial }: { componentId: string | null; initial?: ComponentInput }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ComponentInput>({
    resolver: zodResolver(componentSchema) as unknown as Resolver<ComponentInput>,
    defaultValues: initial ?? { grip: "fair", massSource: "datasheet" },
  });
  const e = formState.errors;

  const onSubmit = handleSubmit(async (values) => {
    setOutcome(null);
    const result = await saveComponentAction(componentId, values);
    if (result.ok) {
      if (!componentId) router.push(`/load-register/${(result.data as { id: string }).id}`);
      else setOutcome({ tone: "success", text: "Saved." });
      router.refresh();
      return;
    }
    for (const issue of result.issues ?? []) setError(issue.path as keyof ComponentInput, { message: issue.message });
    setOutcome({ tone: "error", text: result.message });
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label="Component"
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
    >
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
      <div className="grid gap-3 md:grid-cols-2">
        <TextField label="Name" error={e.name?.message} {...register("name")} />
        <TextField
          label="Mass (kg)"
          type="number"
          step="any"
          inputMode="decimal"
          error={e.massKg?.message}
          {...register("massKg", { setValueAs: (v: string) => (v === "" ? Number.NaN : Number(v)) })}
        />
      </div>
      <div className="grid grid-cols-3 gap-3">
        <TextField
          label="Length (mm)"
          type="number"
          step="1"
          error={e.lengthMm?.message}
          {...register("lengthMm", optionalNumber)}
        />
        <TextField
          label="Width (mm)"
          type="number"
          step="1"
          error={e.widthMm?.message}
          {...register("widthMm", optionalNumber)}
        />
        <TextField
          label="Height (mm)"
          type="number"
          step="1"
          error={e.heightMm?.message}
          {...register("heightMm", optionalNumber)}
        />
      </div>
      <div className="grid gap-3 md:grid-cols-2">
        <SelectField label="Grip" error={e.grip?.message} {...register("grip")}>
          <option value="good">Good — handles or hand-holds that fit</option>
          <option value="fair">Fair — fingers can curl under it</option>
          <option value="poor">Poor — bulky, sharp or no hold</option>
        </SelectField>
        <SelectField label="Mass from" error={e.massSource?.message} {...register("massSource")}>
          <option value="weighed">Weighed</option>
          <option value="datasheet">Maker&apos;s data sheet</option>
          <option value="estimated">Estimated (flagged until confirmed)</option>
        </SelectField>
      </div>
      <TextField label="Notes" error={e.notes?.message} {...register("notes")} />
      <PrimaryButton type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Saving…" : "Save component"}
      </PrimaryButton>
    </form>
  );
}
