"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { SlingDiagram } from "@/app/_components/drawings/sling-diagram";
import {
  controlClass,
  controlProps,
  FieldFrame,
  FormMessage,
  PrimaryButton,
  SecondaryButton,
  withUnit,
} from "@/app/_components/form";
import { ResultPending, TaskResult } from "@/app/_components/results/task-result";
import { liftPlanInputsSchema, type Content } from "@/assessments/method-statement/content";
import { errorAt } from "../../wizard/fields";
import { scoreTask } from "@/assessments/method-statement/score-task";
import { ACCESSORY_KINDS, COMPLEX_FACTORS, type ComplexFactor } from "@/assessments/lift-plan/lift";
import { GROUND_TYPE_KEYS, GROUND_TYPES } from "@/assessments/lift-plan/ground";
import { HITCH_LABELS, HITCHES } from "@/assessments/lift-plan/sling";
import { apiRequest, messageOf } from "@/lib/api-client";

type Plan = z.infer<typeof liftPlanInputsSchema>;

const ROLES = [
  ["appointedPerson", "Appointed person"],
  ["liftSupervisor", "Lift supervisor"],
  ["operator", "Operator"],
  ["slingerSignaller", "Slinger/signaller"],
] as const;

interface Props {
  revisionId: string;
  taskId: string;
  version: number;
  content: Content;
  load: number | null;
  editable: boolean;
}

export function LiftPlanForm({ revisionId, taskId, version, content, load, editable }: Props) {
  const router = useRouter();
  const task = content.tasks.find((t) => t.id === taskId)!;
  const { register, handleSubmit, control, formState } = useForm<Plan>({
    resolver: zodResolver(liftPlanInputsSchema) as Resolver<Plan>,
    defaultValues: task.lift,
    mode: "onChange",
  });
  const exams = useFieldArray({ control, name: "examinations" });
  const accessories = useFieldArray({ control, name: "accessories" });
  const plan = useWatch({ control }) as Plan;
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);

  const score = useMemo(() => {
    const parsed = liftPlanInputsSchema.safeParse(plan);
    return parsed.success && load !== null
      ? scoreTask(
          { ...task, lift: parsed.data },
          { id: "c", name: "", massKg: load / (task.quantity || 1), grip: "poor", massSource: "datasheet" },
        )
      : null;
  }, [plan, load, task]);

  const num = (name: string, label: string, unit?: string, optional = false) => {
    const error = errorAt(formState.errors, name);
    const id = `lp-${name}`;
    return (
      <FieldFrame id={id} label={withUnit(label, unit)} error={error} compact>
        <input
          type="number"
          step="any"
          inputMode="decimal"
          disabled={!editable}
          {...controlProps(id, error)}
          className={controlClass(error, true)}
          {...register(name as "riggingMass", {
            setValueAs: (v: string | number) => (v === "" ? (optional ? undefined : Number.NaN) : Number(v)),
          })}
        />
      </FieldFrame>
    );
  };
  // Optional dates are left out when blank rather than sent as "".
  const text = (name: string, label: string, optional = false) => {
    const error = errorAt(formState.errors, name);
    const id = `lp-${name}`;
    return (
      <FieldFrame id={id} label={label} error={error} compact>
        <input
          disabled={!editable}
          {...controlProps(id, error)}
          className={controlClass(error, true)}
          {...register(
            name as "groundBearingNotes",
            optional ? { setValueAs: (v: string) => (v === "" ? undefined : v) } : undefined,
          )}
        />
      </FieldFrame>
    );
  };

  const onSave = handleSubmit(async (values) => {
    setOutcome(null);
    const next: Content = {
      ...content,
      tasks: content.tasks.map((t) => (t.id === taskId ? { ...t, lift: values } : t)),
    };
    try {
      await apiRequest(`/api/v1/revisions/${revisionId}`, { method: "PUT", json: { version, content: next } });
      setOutcome({ tone: "success", text: "Lift plan saved." });
      router.refresh();
    } catch (err) {
      setOutcome({ tone: "error", text: `Not saved: ${messageOf(err)}` });
    }
  });

  return (
    <form onSubmit={onSave} noValidate className="grid gap-4 lg:grid-cols-[1fr_minmax(0,26rem)]" aria-label="Lift plan">
      <div className="space-y-4">
        <fieldset className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-3">
          <legend className="px-1 font-bold">Machine and load</legend>
          {num("ratedCapacity", "Rated capacity at the radius", "kg")}
          {num("radiusM", "Planned radius", "m", true)}
          {num("maxRadiusM", "Maximum radius", "m", true)}
          {num("riggingMass", "Rigging", "kg")}
          {num("hookBlockMass", "Hook block", "kg")}
          {num("exclusionZoneM", "Exclusion zone radius", "m", true)}
        </fieldset>
        <fieldset className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-4">
          <legend className="px-1 font-bold">Sling</legend>
          <div>
            <label htmlFor="lp-legs" className="block text-sm font-bold">
              Legs
            </label>
            <select
              id="lp-legs"
              disabled={!editable}
              className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
              {...register("sling.legs", { valueAsNumber: true })}
            >
              {[1, 2, 3, 4].map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
          </div>
          {num("sling.angleFromVerticalDeg", "Angle from vertical", "°")}
          {num("sling.legWll", "WLL per leg", "kg")}
          <div>
            <label htmlFor="lp-hitch" className="block text-sm font-bold">
              Hitch
            </label>
            <select
              id="lp-hitch"
              disabled={!editable}
              className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
              {...register("sling.hitch")}
            >
              {HITCHES.map((h) => (
                <option key={h} value={h}>
                  {HITCH_LABELS[h][0].toUpperCase() + HITCH_LABELS[h].slice(1)}
                </option>
              ))}
            </select>
          </div>
          {num("sling.markedWll", "WLL marked on the assembly", "kg")}
          <p className="col-span-2 text-xs text-muted sm:col-span-3">
            The marked limit for this hitch and angle, read from the tag. Where it is lower than leg WLL × mode factor,
            the marked limit governs. A basket or endless sling is one sling: 1 leg.
          </p>
        </fieldset>
        <fieldset className="rounded-lg border border-rule bg-white p-3">
          <legend className="px-1 font-bold">What makes this lift complex</legend>
          <div className="grid gap-1 sm:grid-cols-2">
            {(Object.keys(COMPLEX_FACTORS) as ComplexFactor[]).map((f) => (
              <label key={f} className="flex items-center gap-2 text-sm">
                <input type="checkbox" disabled={!editable} className="h-5 w-5" {...register(`factors.${f}`)} />
                {COMPLEX_FACTORS[f][0].toUpperCase() + COMPLEX_FACTORS[f].slice(1)}
              </label>
            ))}
          </div>
        </fieldset>
        <fieldset className="space-y-2 rounded-lg border border-rule bg-white p-3">
          <legend className="px-1 font-bold">Thorough examinations (LOLER reg. 9)</legend>
          <div className="max-w-xs">{text("liftDate", "Planned lift date (YYYY-MM-DD)", true)}</div>
          {exams.fields.map((field, i) => (
            <div key={field.id} className="grid items-end gap-2 sm:grid-cols-[1fr_10rem_9rem_9rem_auto]">
              {text(`examinations.${i}.item`, "Item")}
              <div>
                <label htmlFor={`lp-ex-kind-${i}`} className="block text-sm font-bold">
                  Kind
                </label>
                <select
                  id={`lp-ex-kind-${i}`}
                  disabled={!editable}
                  className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
                  {...register(`examinations.${i}.kind`)}
                >
                  <option value="equipment">Lifting equipment</option>
                  <option value="accessory">Accessory</option>
                  <option value="lifts-people">Lifts people</option>
                </select>
              </div>
              {text(`examinations.${i}.lastExamined`, "Last examined")}
              {text(`examinations.${i}.schemeDueDate`, "Scheme due (optional)", true)}
              {editable && (
                <SecondaryButton
                  type="button"
                  aria-label={`Remove examination ${i + 1}`}
                  onClick={() => exams.remove(i)}
                >
                  ✕
                </SecondaryButton>
              )}
            </div>
          ))}
          {editable && (
            <SecondaryButton
              type="button"
              onClick={() => exams.append({ item: "", kind: "accessory", lastExamined: "" })}
            >
              Add an examination record
            </SecondaryButton>
          )}
        </fieldset>
        <fieldset className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-3">
          <legend className="px-1 font-bold">Wind</legend>
          {num("wind.inServiceLimitMs", "Maker's in-service limit", "m/s")}
          {num("wind.forecastMs", "Forecast", "m/s")}
          <label className="flex items-center gap-2 self-end pb-2 text-sm font-bold">
            <input type="checkbox" disabled={!editable} className="h-5 w-5" {...register("wind.largeSailArea")} /> Large
            sail area
          </label>
        </fieldset>
        <fieldset className="grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2">
          <legend className="px-1 font-bold">People (BS 7121)</legend>
          {ROLES.map(([key, label]) => (
            <div key={key} className="grid grid-cols-2 gap-2">
              {text(`people.${key}.name`, label)}
              {text(`people.${key}.competenceRef`, "Competence record")}
            </div>
          ))}
        </fieldset>
        <fieldset className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-3">
          <legend className="px-1 font-bold">Ground bearing under the outrigger mats</legend>
          {num("groundBearing.outriggerForceKn", "Maximum outrigger force", "kN, maker's figure")}
          {num("groundBearing.matLengthM", "Mat length", "m")}
          {num("groundBearing.matWidthM", "Mat width", "m")}
          <div>
            <label htmlFor="lp-ground" className="block text-sm font-bold">
              Ground
            </label>
            <select
              id="lp-ground"
              disabled={!editable}
              className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
              {...register("groundBearing.ground", { setValueAs: (v: string) => (v === "" ? undefined : v) })}
            >
              <option value="">Not from the table</option>
              {GROUND_TYPE_KEYS.map((g) => (
                <option key={g} value={g}>
                  {GROUND_TYPES[g].label} ({GROUND_TYPES[g].range})
                </option>
              ))}
            </select>
          </div>
          {num("groundBearing.allowableKpa", "Allowable bearing pressure", "kPa, optional", true)}
          <p className="col-span-2 text-xs text-muted sm:col-span-3">
            An allowable pressure from a ground investigation governs; otherwise the presumed value for the ground type
            (BS 8004:1986 Table 1, withdrawn; lower end of each range) is used. Loose and soft ground has no presumed
            value.
          </p>
          <div className="col-span-2 sm:col-span-3">{text("groundBearingNotes", "Ground and outrigger notes")}</div>
        </fieldset>
        <fieldset className="space-y-2 rounded-lg border border-rule bg-white p-3">
          <legend className="px-1 font-bold">Accessories (shackles, lifting beams, rail clamps)</legend>
          {accessories.fields.map((field, i) => (
            <div key={field.id} className="grid items-end gap-2 sm:grid-cols-[1fr_9rem_8rem_10rem_auto]">
              {text(`accessories.${i}.item`, "Item")}
              <div>
                <label htmlFor={`lp-acc-kind-${i}`} className="block text-sm font-bold">
                  Kind
                </label>
                <select
                  id={`lp-acc-kind-${i}`}
                  disabled={!editable}
                  className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
                  {...register(`accessories.${i}.kind`)}
                >
                  {ACCESSORY_KINDS.map((k) => (
                    <option key={k} value={k}>
                      {k.replace(/-/g, " ")}
                    </option>
                  ))}
                </select>
              </div>
              {num(`accessories.${i}.wllKg`, "WLL", "kg")}
              <div>
                <label htmlFor={`lp-acc-carries-${i}`} className="block text-sm font-bold">
                  Carries
                </label>
                <select
                  id={`lp-acc-carries-${i}`}
                  disabled={!editable}
                  className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
                  {...register(`accessories.${i}.carries`)}
                >
                  <option value="whole-load">The whole load</option>
                  <option value="one-leg">One leg</option>
                </select>
              </div>
              {editable && (
                <SecondaryButton
                  type="button"
                  aria-label={`Remove accessory ${i + 1}`}
                  onClick={() => accessories.remove(i)}
                >
                  ✕
                </SecondaryButton>
              )}
            </div>
          ))}
          {editable && (
            <SecondaryButton
              type="button"
              onClick={() => accessories.append({ item: "", kind: "shackle", wllKg: Number.NaN, carries: "one-leg" })}
            >
              Add an accessory
            </SecondaryButton>
          )}
        </fieldset>
        {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
        {editable && (
          <PrimaryButton type="submit" disabled={formState.isSubmitting}>
            {formState.isSubmitting ? "Saving…" : "Save lift plan"}
          </PrimaryButton>
        )}
      </div>
      <div className="space-y-3">
        {score?.results.lift ? (
          <>
            <SlingDiagram
              hitch={score.results.lift.inputs.sling.hitch ?? "straight"}
              legs={score.results.lift.inputs.sling.legs}
              angleDeg={score.results.lift.inputs.sling.angleFromVerticalDeg}
              tension={score.results.lift.legTension}
              legWll={score.results.lift.inputs.sling.legWll}
              load={score.results.lift.slingLoad}
            />
            <TaskResult score={score} />
          </>
        ) : (
          <ResultPending>
            {load === null ? "Choose the component first." : "Complete the highlighted fields to see the result."}
          </ResultPending>
        )}
      </div>
    </form>
  );
}
