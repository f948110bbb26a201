"use client";

import * as Dialog from "@radix-ui/react-dialog";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch, type Resolver, type UseFormRegister } from "react-hook-form";
import { FormMessage, PrimaryButton, SecondaryButton, SelectField, TextField } from "@/app/_components/form";
import { libraryEntrySchema, type LibraryEntryInput } from "@/assessments/hazard-library/schemas";
import { CONTROL_LEVEL_LABELS, CONTROL_LEVELS, riskRating } from "@/assessments/method-statement/options";
import { deleteEntryAction, saveEntryAction } from "./actions";

const RATINGS = [1, 2, 3, 4, 5];

/** Likelihood and severity, before or after the controls, with their product. */
function RatingPair({
  when,
  register,
  rating,
}: {
  when: "before" | "after";
  register: UseFormRegister<LibraryEntryInput>;
  rating: number;
}) {
  const field = (kind: "likelihood" | "severity") => `${kind}${when === "before" ? "Before" : "After"}` as const;
  return (
    <div className="grid grid-cols-3 gap-3 sm:max-w-lg">
      {(["likelihood", "severity"] as const).map((kind) => (
        <SelectField
          key={kind}
          label={`${kind === "likelihood" ? "Likelihood" : "Severity"} ${when}`}
          {...register(field(kind), { valueAsNumber: true })}
        >
          {RATINGS.map((r) => (
            <option key={r}>{r}</option>
          ))}
        </SelectField>
      ))}
      <p className="self-end pb-2 text-sm">
        Rating <strong className="tabular-nums">{rating}</strong>
      </p>
    </div>
  );
}

/** Add or change one library hazard; the same schema checks it here and on the server. */
export function EntryForm({ entryId, initial }: { entryId: string | null; initial?: LibraryEntryInput }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const [confirm, setConfirm] = useState(false);
  const { register, handleSubmit, setError, control, formState } = useForm<LibraryEntryInput>({
    resolver: zodResolver(libraryEntrySchema) as Resolver<LibraryEntryInput>,
    defaultValues: initial ?? {
      hazard: "",
      whoIsAtRisk: "",
      likelihoodBefore: 3,
      severityBefore: 3,
      controls: [{ text: "", level: "engineering" }],
      likelihoodAfter: 2,
      severityAfter: 3,
    },
  });
  const controls = useFieldArray({ control, name: "controls" });
  const values = useWatch({ control });
  const e = formState.errors;

  const onSubmit = handleSubmit(async (data) => {
    setFailure(null);
    const result = await saveEntryAction(entryId, data);
    if (result.ok) {
      router.push("/hazard-library");
      router.refresh();
      return;
    }
    for (const issue of result.issues ?? [])
      setError(issue.path as keyof LibraryEntryInput, { message: issue.message });
    setFailure(result.message);
  });
  const onDelete = async () => {
    const result = await deleteEntryAction(entryId!);
    if (result.ok) {
      router.push("/hazard-library");
      router.refresh();
    } else setFailure(result.message);
  };
  const rating = (l?: number, s?: number) => riskRating(Number(l), Number(s));

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label="Library hazard"
      className="space-y-4 rounded-lg border border-rule bg-white p-4"
    >
      {failure && <FormMessage tone="error">{failure}</FormMessage>}
      <div className="grid gap-3 md:grid-cols-2">
        <TextField label="Hazard" error={e.hazard?.message} {...register("hazard")} />
        <TextField label="Who is at risk" error={e.whoIsAtRisk?.message} {...register("whoIsAtRisk")} />
      </div>
      <RatingPair when="before" register={register} rating={rating(values.likelihoodBefore, values.severityBefore)} />
      <fieldset className="space-y-2">
        <legend className="font-bold">Controls, by the hierarchy of control</legend>
        {e.controls?.root?.message || e.controls?.message ? (
          <FormMessage tone="error">{e.controls?.root?.message ?? e.controls?.message}</FormMessage>
        ) : null}
        {controls.fields.map((field, j) => (
          <div key={field.id} className="grid grid-cols-[1fr_12rem_auto] items-end gap-2">
            <TextField
              label={`Control ${j + 1}`}
              error={e.controls?.[j]?.text?.message}
              {...register(`controls.${j}.text`)}
            />
            <SelectField label="Level" {...register(`controls.${j}.level`)}>
              {CONTROL_LEVELS.map((l) => (
                <option key={l} value={l}>
                  {CONTROL_LEVEL_LABELS[l]}
                </option>
              ))}
            </SelectField>
            <SecondaryButton type="button" aria-label={`Remove control ${j + 1}`} onClick={() => controls.remove(j)}>
              ✕
            </SecondaryButton>
          </div>
        ))}
        <SecondaryButton type="button" onClick={() => controls.append({ text: "", level: "engineering" })}>
          Add a control
        </SecondaryButton>
      </fieldset>
      <RatingPair when="after" register={register} rating={rating(values.likelihoodAfter, values.severityAfter)} />
      <div className="flex flex-wrap gap-2">
        <PrimaryButton type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : "Save to the library"}
        </PrimaryButton>
        {entryId && (
          <Dialog.Root open={confirm} onOpenChange={setConfirm}>
            <Dialog.Trigger asChild>
              <SecondaryButton type="button">Remove from the library</SecondaryButton>
            </Dialog.Trigger>
            <Dialog.Portal>
              <Dialog.Overlay className="fixed inset-0 bg-black/40" />
              <Dialog.Content className="fixed left-1/2 top-1/2 w-[min(28rem,92vw)] -translate-x-1/2 -translate-y-1/2 space-y-3 rounded-lg bg-white p-5 shadow-lg">
                <Dialog.Title className="text-lg font-bold">Remove this hazard from the library?</Dialog.Title>
                <Dialog.Description className="text-sm">
                  Assessments that already copied it keep their own copy.
                </Dialog.Description>
                <div className="flex justify-end gap-2">
                  <Dialog.Close asChild>
                    <SecondaryButton type="button">Keep it</SecondaryButton>
                  </Dialog.Close>
                  <PrimaryButton type="button" onClick={onDelete}>
                    Remove
                  </PrimaryButton>
                </div>
              </Dialog.Content>
            </Dialog.Portal>
          </Dialog.Root>
        )}
      </div>
    </form>
  );
}
