"use client";

/** The lineside sections of the method statement: working near the line; permits, buried services and excavations. */
import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { SecondaryButton } from "@/app/_components/form";
import type { Content } from "@/assessments/method-statement/content";
import {
  EXCAVATION_SUPPORT,
  NEAR_LINE,
  NEAR_LINE_LABELS,
  PERMIT_KINDS,
  PERMIT_LABELS,
  PROTECTION_ARRANGEMENTS,
  PROTECTION_LABELS,
  SUPPORT_LABELS,
} from "@/assessments/method-statement/options";
import { belowStandingLevelTasks } from "@/assessments/method-statement/score-task";
import { LINE_CAUTION } from "@/assessments/method-statement/lineside";
import { Check, Choice, DateField, Num, Text } from "./fields";

export function LineStep() {
  const nearLine = useWatch<Content, "lineside.nearLine">({ name: "lineside.nearLine" });
  const protection = useWatch<Content, "lineside.protection">({ name: "lineside.protection" });
  return (
    <div className="space-y-4">
      <p className="rounded border-l-4 border-band-watch bg-paper p-3 text-sm">{LINE_CAUTION}</p>
      <Choice
        name="lineside.nearLine"
        label="Where is the work?"
        options={NEAR_LINE.map((n) => [n, NEAR_LINE_LABELS[n]] as const)}
      />
      {nearLine !== "not-near" && (
        <>
          <fieldset className="space-y-3 rounded border border-rule p-3">
            <legend className="px-1 font-bold">Protection from trains</legend>
            <Choice
              name="lineside.protection"
              label="Protection arrangement"
              placeholder="Choose the arrangement…"
              options={PROTECTION_ARRANGEMENTS.map((p) => [p, PROTECTION_LABELS[p]] as const)}
            />
            <Text
              name="lineside.protectionDetail"
              label={protection === "other" ? "Describe the arrangement" : "Details of the arrangement"}
              area
              hint="Where the barrier or limit runs, the times of the blockage or possession, how warning is given."
            />
            <div className="grid gap-3 md:grid-cols-3">
              <Text name="lineside.responsibleName" label="Person responsible for the safe system of work" />
              <Text name="lineside.responsibleCompetence" label="Their competence reference" />
              <Text name="lineside.planningRef" label="Planning reference of the arrangement" />
            </div>
          </fieldset>
          <fieldset className="space-y-3 rounded border border-rule p-3">
            <legend className="px-1 font-bold">Getting there and keeping clear</legend>
            <Text name="lineside.accessPoint" label="Access point" />
            <Text name="lineside.walkingRoute" label="Walking route from the access point" area />
            <Text
              name="lineside.positionsOfSafety"
              label="Positions of safety"
              area
              hint="Where each one is, and how long it takes to reach it with the load put down."
            />
            <Text
              name="lineside.limits"
              label="Limits the gang keeps"
              area
              hint="Distances from the nearest rail; no plant or long items beyond the marked line."
            />
          </fieldset>
        </>
      )}
    </div>
  );
}

export function GroundStep() {
  const { control } = useFormContext<Content>();
  const permits = useFieldArray({ control, name: "permits" });
  const listed = useWatch<Content, "permits">({ name: "permits" }) ?? [];
  const present = useWatch<Content, "excavation.present">({ name: "excavation.present" });
  const content = useWatch<Content>() as Content;
  const lowering = belowStandingLevelTasks({ ...content, tasks: content.tasks ?? [] });
  return (
    <div className="space-y-5">
      <fieldset className="space-y-2">
        <legend className="font-bold">Permits the work needs</legend>
        <p className="text-sm text-muted">
          Each permit listed here is needed: give its reference and who issues it before the assessment is submitted.
        </p>
        {permits.fields.map((field, i) => (
          <div
            key={field.id}
            className="grid items-end gap-2 rounded border border-rule p-2 md:grid-cols-[14rem_1fr_1fr] lg:grid-cols-[14rem_1fr_1fr_9.5rem_9.5rem_auto]"
            aria-label={`Permit ${i + 1}`}
            role="group"
          >
            <Choice
              name={`permits.${i}.kind`}
              label="Permit"
              options={PERMIT_KINDS.map((k) => [k, PERMIT_LABELS[k]] as const)}
            />
            {listed[i]?.kind === "other" ? (
              <Text name={`permits.${i}.description`} label="Which permit" />
            ) : (
              <Text name={`permits.${i}.issuedBy`} label="Issued by" />
            )}
            <Text name={`permits.${i}.reference`} label="Reference" />
            {listed[i]?.kind === "other" && <Text name={`permits.${i}.issuedBy`} label="Issued by" />}
            <DateField name={`permits.${i}.validFrom`} label="Valid from" />
            <DateField name={`permits.${i}.validTo`} label="Valid to" />
            <SecondaryButton type="button" aria-label={`Remove permit ${i + 1}`} onClick={() => permits.remove(i)}>
              ✕
            </SecondaryButton>
          </div>
        ))}
        <SecondaryButton
          type="button"
          onClick={() =>
            permits.append({ kind: "dig", description: "", reference: "", issuedBy: "", validFrom: "", validTo: "" })
          }
        >
          Add a permit
        </SecondaryButton>
      </fieldset>

      <fieldset className="space-y-3 rounded border border-rule p-3">
        <legend className="px-1 font-bold">Buried services: the checks before digging</legend>
        <div className="grid gap-3 md:grid-cols-2">
          <Check name="buriedServices.recordsObtained" label="Service records obtained" />
          <Text name="buriedServices.recordsRef" label="Records reference" />
          <Check name="buriedServices.scanned" label="Scanned with a cable locating tool" />
          <div className="grid grid-cols-2 gap-2">
            <Text name="buriedServices.scannedBy" label="Scanned by" />
            <DateField name="buriedServices.scanDate" label="Scanned on" />
          </div>
        </div>
        <Text
          name="buriedServices.trialHoles"
          label="Trial holes dug by hand"
          area
          hint="Where, and what they found."
        />
        <div className="grid gap-3 md:grid-cols-[12rem_1fr]">
          <Num name="buriedServices.handDigWithinM" label="Hand-dig within" unit="m of a located service" optional />
          <Text
            name="buriedServices.rule"
            label="The rule the gang follows"
            hint="For example: no powered tools within the set distance of a located service; stop and call the supervisor on finding anything unmarked."
          />
        </div>
      </fieldset>

      <fieldset className="space-y-3 rounded border border-rule p-3">
        <legend className="px-1 font-bold">Excavations</legend>
        <Check name="excavation.present" label="The work includes an excavation" />
        {lowering.length > 0 && (
          <p className="text-sm" data-testid="lowering-tasks">
            Loads lowered below the standing surface in this assessment:{" "}
            {lowering.map((t) => t.description || "a task without a description").join("; ")}.
          </p>
        )}
        {present && (
          <div className="space-y-3">
            <div className="grid gap-3 md:grid-cols-[10rem_1fr]">
              <Num name="excavation.depthM" label="Depth" unit="m" optional />
              <Choice
                name="excavation.support"
                label="Support or battering"
                placeholder="Choose…"
                options={EXCAVATION_SUPPORT.map((e) => [e, SUPPORT_LABELS[e]] as const)}
              />
            </div>
            <Text name="excavation.supportDetail" label="Details of the support" area />
            <Text name="excavation.edgeProtection" label="Edge protection and barriers" area />
            <Text
              name="excavation.inspection"
              label="Inspection"
              area
              hint="Who inspects it, before each shift and after rain, vibration or anything that could weaken it."
            />
            <Text name="excavation.accessEgress" label="Safe access and egress" area />
            <Text
              name="excavation.lowering"
              label="How components are lowered into it"
              area
              hint="Linked to the loads above that go below the standing surface."
            />
          </div>
        )}
      </fieldset>
    </div>
  );
}
