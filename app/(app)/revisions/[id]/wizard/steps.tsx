"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { hazardFromLibrary } from "@/assessments/hazard-library/copy";
import type { LibraryEntry } from "@/assessments/hazard-library/schemas";
import { SecondaryButton } from "@/app/_components/form";
import type { Content } from "@/assessments/method-statement/content";
import { CONTROL_LEVEL_LABELS, CONTROL_LEVELS, riskRating } from "@/assessments/method-statement/options";
import { apiRequest, messageOf } from "@/lib/api-client";
import { Choice, DateField, Num, Text } from "./fields";

const newId = (prefix: string) => `${prefix}-${crypto.randomUUID().slice(0, 8)}`;
const RATINGS = [1, 2, 3, 4, 5].map((n) => [n, String(n)] as const);

export function ScopeStep() {
  return (
    <div className="space-y-3">
      <Text
        name="scope.summary"
        label="Scope of the work"
        area
        hint="What is installed, where, and what is not included."
      />
      <div className="grid max-w-md grid-cols-2 gap-3">
        <DateField name="scope.startDate" label="Planned start" />
        <Num name="scope.durationShifts" label="Shifts" step="1" />
      </div>
    </div>
  );
}

export function SequenceStep() {
  const { control } = useFormContext<Content>();
  const { fields, append, remove, move } = useFieldArray({ control, name: "sequence" });
  return (
    <div className="space-y-2">
      <ol className="space-y-2">
        {fields.map((field, i) => (
          <li key={field.id} className="flex items-end gap-2">
            <span className="mb-2 w-6 text-right font-bold tabular-nums">{i + 1}.</span>
            <div className="flex-1">
              <Text name={`sequence.${i}.text`} label={`Step ${i + 1}`} />
            </div>
            <SecondaryButton
              type="button"
              aria-label={`Move step ${i + 1} up`}
              disabled={i === 0}
              onClick={() => move(i, i - 1)}
            >
              ↑
            </SecondaryButton>
            <SecondaryButton
              type="button"
              aria-label={`Move step ${i + 1} down`}
              disabled={i === fields.length - 1}
              onClick={() => move(i, i + 1)}
            >
              ↓
            </SecondaryButton>
            <SecondaryButton type="button" aria-label={`Remove step ${i + 1}`} onClick={() => remove(i)}>
              ✕
            </SecondaryButton>
          </li>
        ))}
      </ol>
      <SecondaryButton type="button" onClick={() => append({ id: newId("s"), text: "" })}>
        Add a step
      </SecondaryButton>
    </div>
  );
}

function HazardRow({ index, onRemove }: { index: number; onRemove: () => void }) {
  const { control } = useFormContext<Content>();
  const { fields, append, remove } = useFieldArray({ control, name: `hazards.${index}.controls` });
  const h = useWatch<Content, `hazards.${number}`>({ name: `hazards.${index}` });
  const before = riskRating(Number(h?.likelihoodBefore), Number(h?.severityBefore));
  const after = riskRating(Number(h?.likelihoodAfter), Number(h?.severityAfter));
  return (
    <article className="space-y-2 rounded-lg border border-rule bg-paper p-3" aria-label={`Hazard ${index + 1}`}>
      <div className="flex justify-between gap-2">
        <h3 className="font-bold">Hazard {index + 1}</h3>
        <SecondaryButton type="button" onClick={onRemove}>
          Remove hazard
        </SecondaryButton>
      </div>
      <div className="grid gap-2 md:grid-cols-2">
        <Text name={`hazards.${index}.hazard`} label="Hazard" />
        <Text name={`hazards.${index}.whoIsAtRisk`} label="Who is at risk" />
      </div>
      <div className="grid grid-cols-3 gap-2 sm:max-w-md">
        <Choice name={`hazards.${index}.likelihoodBefore`} label="Likelihood before" options={RATINGS} asNumber />
        <Choice name={`hazards.${index}.severityBefore`} label="Severity before" options={RATINGS} asNumber />
        <p className="self-end pb-2 text-sm">
          Rating <strong className="tabular-nums">{before}</strong>
        </p>
      </div>
      <fieldset className="space-y-2">
        <legend className="text-sm font-bold">Controls, by the hierarchy of control</legend>
        {fields.map((field, j) => (
          <div key={field.id} className="grid grid-cols-[1fr_12rem_auto] items-end gap-2">
            <Text name={`hazards.${index}.controls.${j}.text`} label={`Control ${j + 1}`} />
            <Choice
              name={`hazards.${index}.controls.${j}.level`}
              label="Level"
              options={CONTROL_LEVELS.map((l) => [l, CONTROL_LEVEL_LABELS[l]] as const)}
            />
            <SecondaryButton type="button" aria-label={`Remove control ${j + 1}`} onClick={() => remove(j)}>
              ✕
            </SecondaryButton>
          </div>
        ))}
        <SecondaryButton type="button" onClick={() => append({ text: "", level: "engineering" })}>
          Add a control
        </SecondaryButton>
      </fieldset>
      <div className="grid grid-cols-3 gap-2 sm:max-w-md">
        <Choice name={`hazards.${index}.likelihoodAfter`} label="Likelihood after" options={RATINGS} asNumber />
        <Choice name={`hazards.${index}.severityAfter`} label="Severity after" options={RATINGS} asNumber />
        <p className="self-end pb-2 text-sm">
          Rating <strong className="tabular-nums">{after}</strong>
        </p>
      </div>
    </article>
  );
}

/** A hazard from the organisation's library, copied into this assessment to be changed for the job. */
/**
 * The organisation's hazard library, asked for as the adviser heads for this step (see Wizard) rather than sent
 * with every page of it: only the hazards step uses it.
 */
export const hazardLibraryQuery = {
  queryKey: ["hazard-library"],
  queryFn: ({ signal }: { signal: AbortSignal }) =>
    apiRequest<{ items: LibraryEntry[] }>("/api/v1/hazard-library", { signal }).then((r) => r.items),
  staleTime: 60_000,
};

function LibraryPicker({ onPick }: { onPick: (entry: LibraryEntry) => void }) {
  const [chosen, setChosen] = useState("");
  const library = useQuery(hazardLibraryQuery);
  if (library.isPending)
    return (
      <p role="status" className="rounded-lg border border-rule bg-white p-3 text-sm text-muted">
        Loading the hazard library…
      </p>
    );
  if (library.isError)
    return (
      <div role="alert" className="flex flex-wrap items-center gap-2 rounded-lg border-l-4 border-danger bg-white p-3">
        <p className="text-sm">
          The hazard library could not be loaded ({messageOf(library.error)}). Add hazards below by hand, or try again.
        </p>
        <SecondaryButton type="button" onClick={() => void library.refetch()}>
          Try again
        </SecondaryButton>
      </div>
    );
  if (library.data.length === 0) return null;
  const entry = library.data.find((e) => e.id === chosen);
  return (
    <div className="flex flex-wrap items-end gap-2 rounded-lg border border-rule bg-white p-3">
      <div className="min-w-0 flex-1">
        <label htmlFor="library-pick" className="block text-sm font-bold">
          From the hazard library
        </label>
        <select
          id="library-pick"
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
          className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
        >
          <option value="">Choose a hazard…</option>
          {library.data.map((e) => (
            <option key={e.id} value={e.id}>
              {e.hazard}
            </option>
          ))}
        </select>
      </div>
      <SecondaryButton
        type="button"
        disabled={!entry}
        onClick={() => {
          if (entry) onPick(entry);
          setChosen("");
        }}
      >
        Add with its controls
      </SecondaryButton>
    </div>
  );
}

/** `fromLibrary`: whether the caller may read the hazard library (and is offered its entries). */
export function HazardsStep({ fromLibrary }: { fromLibrary: boolean }) {
  const { control } = useFormContext<Content>();
  const { fields, append, remove } = useFieldArray({ control, name: "hazards" });
  return (
    <div className="space-y-3">
      <p className="text-sm text-muted">
        Likelihood and severity from 1 to 5; the rating is their product. Prefer controls higher in the hierarchy:
        eliminate, substitute, engineering, then administrative, then PPE.
      </p>
      {fromLibrary && <LibraryPicker onPick={(entry) => append(hazardFromLibrary(entry, newId("h")))} />}
      {fields.map((field, i) => (
        <HazardRow key={field.id} index={i} onRemove={() => remove(i)} />
      ))}
      <SecondaryButton
        type="button"
        onClick={() =>
          append({
            id: newId("h"),
            hazard: "",
            whoIsAtRisk: "",
            likelihoodBefore: 3,
            severityBefore: 3,
            controls: [],
            likelihoodAfter: 2,
            severityAfter: 3,
          })
        }
      >
        Add a hazard
      </SecondaryButton>
    </div>
  );
}

function LineList({ name, label, addLabel }: { name: "people.plant" | "people.ppe"; label: string; addLabel: string }) {
  const { setValue } = useFormContext<Content>();
  const items = (useWatch<Content, typeof name>({ name }) ?? []) as string[];
  return (
    <fieldset className="space-y-2">
      <legend className="font-bold">{label}</legend>
      {items.map((_, i) => (
        <div key={i} className="flex items-end gap-2">
          <div className="flex-1">
            <Text name={`${name}.${i}`} label={`${label} ${i + 1}`} />
          </div>
          <SecondaryButton
            type="button"
            aria-label={`Remove ${label.toLowerCase()} ${i + 1}`}
            onClick={() =>
              setValue(
                name,
                items.filter((__, j) => j !== i),
                { shouldDirty: true },
              )
            }
          >
            ✕
          </SecondaryButton>
        </div>
      ))}
      <SecondaryButton type="button" onClick={() => setValue(name, [...items, ""], { shouldDirty: true })}>
        {addLabel}
      </SecondaryButton>
    </fieldset>
  );
}

export function PeopleStep() {
  const { control } = useFormContext<Content>();
  const { fields, append, remove } = useFieldArray({ control, name: "people.roles" });
  return (
    <div className="space-y-5">
      <fieldset className="space-y-2">
        <legend className="font-bold">People and their roles</legend>
        {fields.map((field, i) => (
          <div key={field.id} className="grid items-end gap-2 md:grid-cols-[1fr_1fr_1fr_auto]">
            <Text name={`people.roles.${i}.role`} label="Role" />
            <Text name={`people.roles.${i}.name`} label="Name" />
            <Text name={`people.roles.${i}.competence`} label="Competence card or record" />
            <SecondaryButton type="button" aria-label={`Remove role ${i + 1}`} onClick={() => remove(i)}>
              ✕
            </SecondaryButton>
          </div>
        ))}
        <SecondaryButton type="button" onClick={() => append({ role: "", name: "", competence: "" })}>
          Add a person
        </SecondaryButton>
      </fieldset>
      <LineList name="people.plant" label="Plant and equipment" addLabel="Add plant" />
      <LineList name="people.ppe" label="PPE" addLabel="Add PPE" />
    </div>
  );
}

export function EmergencyStep() {
  return (
    <div className="space-y-3">
      <Text name="emergency.nearestHospital" label="Nearest hospital with an emergency department" />
      <Text
        name="emergency.arrangements"
        label="Emergency arrangements"
        area
        hint="Who calls whom, the meeting point for the ambulance, first aid, the line's emergency contact."
      />
      <fieldset className="space-y-3 rounded border border-rule p-3">
        <legend className="px-1 font-bold">Environment and welfare</legend>
        <Text
          name="environment.spoilAndWaste"
          label="Spoil and waste"
          area
          hint="Where spoil is stockpiled, how waste leaves site."
        />
        <div className="grid gap-3 md:grid-cols-2">
          <Text name="environment.spillKit" label="Spill kit" hint="Where it is kept, who is trained to use it." />
          <Text name="environment.backfill" label="Backfill materials" />
        </div>
        <Text name="environment.noiseAndDust" label="Noise and dust" area />
        <Text name="environment.welfare" label="Welfare facilities" area />
        <Text
          name="emergency.environment"
          label="Other environmental notes"
          area
          hint="Wildlife, watercourses, neighbours."
        />
      </fieldset>
    </div>
  );
}
