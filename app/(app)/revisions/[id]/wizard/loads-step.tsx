"use client";

import dynamic from "next/dynamic";
import Link from "next/link";
import { useMemo } from "react";
import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { HandZonesDrawing } from "@/app/_components/drawings/hand-zones";
import { SecondaryButton } from "@/app/_components/form";
import { ResultPending, TaskResult } from "@/app/_components/results/task-result";
import type { Content, Task } from "@/assessments/method-statement/content";
import { OPERATION_LABELS, OPERATIONS, type Operation } from "@/assessments/method-statement/options";
import { scoreTask, type RegisterEntry, type TaskScore } from "@/assessments/method-statement/score-task";
import { ZONE_LABELS, ZONES } from "@/assessments/rules/filter";
import { SURFACES } from "@/assessments/rules/push";
import { CONDITION_TEXT, CONDITIONS } from "@/assessments/rules/conditions";
import type { Validation } from "./checks";
import { ComponentPicker } from "./component-picker";
import { Check, Choice, GradientField, Num, Text } from "./fields";
// The chart library is the heaviest part of the wizard: loaded after the page is usable, and only
// where a chart is drawn.
const WhatIfChart = dynamic(() => import("./what-if-chart").then((m) => m.WhatIfChart), {
  ssr: false,
  loading: () => <p className="text-sm text-muted">Drawing the what-if chart…</p>,
});

const SEX = [
  ["male", "Men"],
  ["female", "Women"],
] as const;
const REACH = [
  ["close", "Close to the body"],
  ["extended", "At arm's length"],
] as const;
const COUPLING = [
  ["good", "Good"],
  ["fair", "Fair"],
  ["poor", "Poor"],
] as const;
const ZONE_OPTIONS = ZONES.map((z) => [z, ZONE_LABELS[z]] as const);
const SURFACE = SURFACES.map(
  (s) =>
    [
      s,
      s === "rail" ? "Rails (track trolley)" : s === "hard" ? "Hard, even ground" : "Rough: ballast, cess, grass",
    ] as const,
);

/** Inputs a new operation needs, filled with typical values the adviser then changes. */
export function defaultsFor(operation: Operation, component: RegisterEntry | undefined, quantity = 1): Partial<Task> {
  const coupling = component?.grip ?? "fair";
  const filter = {
    sex: "male" as const,
    zone: "knuckle-to-elbow" as const,
    reach: "close" as const,
    frequency: 0.5,
    twistDeg: 0,
    teamSize: 1,
  };
  switch (operation) {
    case "lift":
      return {
        niosh: {
          origin: { h: 30, v: 40, a: 0 },
          destination: { h: 30, v: 100, a: 0 },
          frequency: 0.5,
          durationHours: 1,
          coupling,
          controlAtDestination: false,
        },
        filter,
      };
    case "team-lift":
      return { filter: { ...filter, teamSize: 2 } };
    case "carry":
      return { filter: { ...filter, carryDistanceM: 10, durationHours: 1 } };
    case "push":
      return {
        push: {
          mass: (component?.massKg ?? 0) * quantity + 60,
          gradient: 0,
          sex: "male",
          teamSize: 1,
          distanceM: 20,
          surface: "rail",
          braked: true,
          brakeOperator: "",
        },
      };
    case "equipment":
      return {
        lift: {
          riggingMass: 20,
          hookBlockMass: 15,
          ratedCapacity: 1000,
          sling: { legs: 2, angleFromVerticalDeg: 30, legWll: 1000, hitch: "straight" },
          factors: {},
          examinations: [],
          people: {},
        },
      };
  }
}

/** The working environment of the task: each condition ticked lifts it to at least Watch. */
function ConditionsField({ name }: { name: `tasks.${number}.conditions` }) {
  const { register } = useFormContext<Content>();
  return (
    <fieldset className="rounded border border-rule p-2">
      <legend className="px-1 text-sm font-bold">Working conditions</legend>
      <p className="text-xs text-muted">
        Tick each one present where the load is handled; each lifts the task to at least Watch, with its controls.
      </p>
      <div className="mt-1 grid gap-1 sm:grid-cols-2">
        {CONDITIONS.map((c) => (
          <label key={c} className="flex items-center gap-2 text-sm">
            <input type="checkbox" value={c} className="h-5 w-5" {...register(name)} />
            {CONDITION_TEXT[c].label[0].toUpperCase() + CONDITION_TEXT[c].label.slice(1)}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

interface RegisterProps {
  /** The register entries known on this page: those the tasks use, and any chosen since. */
  register: RegisterEntry[];
  onChosen: (entry: RegisterEntry) => void;
  results: {
    /** The server's result of each task as saved (its content passed the schema), until the first change. */
    saved: TaskScore[] | null;
    /** The schemas, once loaded: after a change, tasks are checked and scored here. */
    validation: Validation | null;
  };
}

function TaskEditor({
  index,
  register,
  onChosen,
  results: { saved, validation },
  revisionId,
  onRemove,
}: RegisterProps & { index: number; revisionId: string; onRemove: () => void }) {
  const { setValue, getValues, register: reg } = useFormContext<Content>();
  const task = useWatch<Content, `tasks.${number}`>({ name: `tasks.${index}` }) as Task;
  const component = register.find((c) => c.id === task.componentId);
  // As saved, the task shows the server's result. Once changed, it is scored here only when its inputs
  // pass the same schema the server applies: a half-typed or out-of-range value (a negative count,
  // say) must never show a band, and neither must an old result while the schemas load.
  const check = useMemo(
    () => (saved || !validation ? null : validation.taskSchema.safeParse(task)),
    [saved, validation, task],
  );
  const validTask = saved ? task : check?.success ? check.data : null;
  const score = useMemo(
    () => (saved ? (saved[index] ?? null) : validTask ? scoreTask(validTask, component) : null),
    [saved, index, validTask, component],
  );
  const p = `tasks.${index}` as const;

  // A new operation gets the inputs it needs; inputs already typed are kept, but a team lift needs
  // a team and a carry a distance.
  const onOperation = (operation: Operation) => {
    const current = getValues(p);
    const defaults = defaultsFor(operation, component, current.quantity || 1);
    for (const [key, value] of Object.entries(defaults)) {
      if (!current[key as keyof Task])
        setValue(`${p}.${key}` as `tasks.${number}.niosh`, value as Task["niosh"], { shouldValidate: true });
    }
    const filter = current.filter;
    if (filter && operation === "team-lift" && filter.teamSize < 2)
      setValue(`${p}.filter.teamSize`, 2, { shouldValidate: true });
    if (filter && operation === "carry" && !filter.carryDistanceM) {
      setValue(`${p}.filter.carryDistanceM`, 10, { shouldValidate: true });
      setValue(`${p}.filter.durationHours`, 1, { shouldValidate: true });
    }
  };

  return (
    <article
      className="rounded-lg border border-rule bg-paper p-3"
      aria-label={`Task ${index + 1}`}
      data-testid={`task-${index}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 className="text-lg font-bold">Task {index + 1}</h3>
        <SecondaryButton type="button" onClick={onRemove}>
          Remove task
        </SecondaryButton>
      </div>
      <div className="mt-2 grid gap-4 lg:grid-cols-[1fr_minmax(0,26rem)]">
        <div className="space-y-3">
          <Text name={`${p}.description`} label="What is done" />
          <div className="grid gap-3 sm:grid-cols-[1fr_6rem]">
            <ComponentPicker
              id={`f-${p}.componentId`}
              chosen={component}
              missing={!!task.componentId && !component}
              onChoose={(entry) => {
                if (entry) onChosen(entry);
                setValue(`${p}.componentId`, entry?.id ?? null, { shouldValidate: true, shouldDirty: true });
              }}
            />
            <Num name={`${p}.quantity`} label="How many" step="1" />
          </div>
          <div>
            <label htmlFor={`f-${p}.operation`} className="block text-sm font-bold">
              Operation
            </label>
            <select
              id={`f-${p}.operation`}
              className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
              {...reg(`${p}.operation`, { onChange: (e) => onOperation(e.target.value as Operation) })}
            >
              {OPERATIONS.map((o) => (
                <option key={o} value={o}>
                  {OPERATION_LABELS[o]}
                </option>
              ))}
            </select>
          </div>

          {task.operation === "lift" && task.niosh && (
            <fieldset className="space-y-2 rounded border border-rule p-2">
              <legend className="px-1 text-sm font-bold">Hand positions (metric)</legend>
              <div className="grid grid-cols-3 gap-2">
                <Num name={`${p}.niosh.origin.h`} label="H at start" unit="cm" />
                <Num name={`${p}.niosh.origin.v`} label="V at start" unit="cm" />
                <Num name={`${p}.niosh.origin.a`} label="Twist at start" unit="°" />
                <Num name={`${p}.niosh.destination.h`} label="H at end" unit="cm" />
                <Num name={`${p}.niosh.destination.v`} label="V at end" unit="cm" />
                <Num name={`${p}.niosh.destination.a`} label="Twist at end" unit="°" />
                <Num name={`${p}.niosh.frequency`} label="Lifts a minute" />
                <Num name={`${p}.niosh.durationHours`} label="Duration" unit="h" />
                <Num name={`${p}.niosh.recoveryHours`} label="Rest after" unit="h" optional />
                <Choice name={`${p}.niosh.coupling`} label="Grip" options={COUPLING} />
              </div>
              <Check name={`${p}.niosh.controlAtDestination`} label="The load must be placed carefully at the end" />
              <p className="text-xs text-muted">
                V below 0 is below the standing surface (into an excavation or trough). &ldquo;Rest after&rdquo;: rest
                or light work once the lifting ends — up to 1 h of lifting counts as short only with at least 1.2 × that
                time of rest, up to 2 h with 0.3 ×; left blank, the long (2–8 h) column is used.
              </p>
            </fieldset>
          )}
          {task.filter && task.operation !== "push" && task.operation !== "equipment" && (
            <fieldset className="space-y-2 rounded border border-rule p-2">
              <legend className="px-1 text-sm font-bold">Guideline weights</legend>
              {task.operation === "lift" && (
                <p className="text-xs text-muted">Frequency and twist come from the hand positions above.</p>
              )}
              <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
                <Choice name={`${p}.filter.sex`} label="Figures for" options={SEX} />
                <Choice name={`${p}.filter.zone`} label="Hands between" options={ZONE_OPTIONS} />
                <Choice name={`${p}.filter.reach`} label="Reach" options={REACH} />
                {task.operation !== "lift" && <Num name={`${p}.filter.frequency`} label="Times a minute" />}
                {task.operation !== "lift" && <Num name={`${p}.filter.twistDeg`} label="Twist" unit="°" />}
                {task.operation !== "lift" && <Num name={`${p}.filter.teamSize`} label="People" step="1" />}
                {task.operation === "carry" && (
                  <Num name={`${p}.filter.carryDistanceM`} label="Carried" unit="m" optional />
                )}
                {task.operation === "carry" && (
                  <Num name={`${p}.filter.durationHours`} label="Hours of carrying" unit="h" optional />
                )}
              </div>
            </fieldset>
          )}
          {task.operation === "push" && task.push && (
            <fieldset className="space-y-2 rounded border border-rule p-2">
              <legend className="px-1 text-sm font-bold">Trolley, barrow or wheeled case</legend>
              <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
                <Num name={`${p}.push.mass`} label="Loaded mass" unit="kg" />
                <Choice name={`${p}.push.surface`} label="Runs on" options={SURFACE} />
                <Choice name={`${p}.push.sex`} label="Figures for" options={SEX} />
                <GradientField name={`${p}.push.gradient`} label="Gradient along the way" />
                <Num name={`${p}.push.teamSize`} label="People" step="1" />
                <Num name={`${p}.push.distanceM`} label="Distance" unit="m" optional />
                <Num name={`${p}.push.measuredForceN`} label="Measured force" unit="N, optional" optional />
                <Num name={`${p}.push.rollingCoefficient`} label="Rolling resistance" unit="optional" optional />
                <div className="self-end pb-2">
                  <Check name={`${p}.push.braked`} label="Braked" />
                </div>
                {task.push.braked && <Text name={`${p}.push.brakeOperator`} label="Who works the brake" />}
              </div>
              {task.push.surface === "rail" && (
                <p className="text-xs text-muted">
                  Trolley use on the line follows the infrastructure manager&rsquo;s rules; Heftwise does not replace
                  them.
                </p>
              )}
            </fieldset>
          )}
          {task.operation !== "equipment" && <ConditionsField name={`${p}.conditions`} />}
          {task.operation === "equipment" && (
            <p className="rounded border border-rule bg-white p-2 text-sm">
              A lift with equipment needs a lift plan.{" "}
              <Link href={`/revisions/${revisionId}/lifts/${task.id}`} className="font-bold text-accent underline">
                Open the lift plan
              </Link>{" "}
              (your changes here are saved first).
            </p>
          )}
          {task.operation !== "equipment" && validTask && <WhatIfChart task={validTask} component={component} />}
        </div>
        <div className="space-y-3">
          {score ? (
            <TaskResult score={score} />
          ) : (
            <ResultPending>
              {!saved && !validation ? "Checking the task…" : "Complete the highlighted fields to see the result."}
            </ResultPending>
          )}
          {(task.operation === "lift" || task.filter) &&
            task.operation !== "push" &&
            task.operation !== "equipment" && <HandZonesDrawing highlight={task.filter?.zone} />}
        </div>
      </div>
    </article>
  );
}

export function LoadsStep({ register, onChosen, results, revisionId }: RegisterProps & { revisionId: string }) {
  const { control } = useFormContext<Content>();
  const { fields, append, remove } = useFieldArray({ control, name: "tasks" });
  return (
    <div className="space-y-4">
      <p className="text-sm text-muted">
        Each handling task is scored as you type, by the same rules that score it when the draft is saved.
      </p>
      {fields.map((field, i) => (
        <TaskEditor
          key={field.id}
          index={i}
          register={register}
          onChosen={onChosen}
          results={results}
          revisionId={revisionId}
          onRemove={() => remove(i)}
        />
      ))}
      <SecondaryButton
        type="button"
        onClick={() =>
          append({
            id: `t-${crypto.randomUUID().slice(0, 8)}`,
            description: "",
            componentId: null,
            quantity: 1,
            operation: "lift",
            conditions: [],
            ...defaultsFor("lift", undefined),
          })
        }
      >
        Add a handling task
      </SecondaryButton>
    </div>
  );
}
