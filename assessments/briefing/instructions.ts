/**
 * Plain words for the gang: each load's handling instruction derived from the assessment and its
 * stored result, for the briefing screens and the briefing sheet. Pure.
 */
import { ukDate } from "@/lib/dates";
import type { Content, Task } from "../method-statement/content";
import { NEAR_LINE_LABELS, PROTECTION_LABELS, SUPPORT_LABELS } from "../method-statement/options";
import { permitName } from "../method-statement/lineside";
import type { TaskScore } from "../method-statement/score-task";
import { whatIfLines } from "../method-statement/what-if";
import { fmt } from "../rules/format";
import { CONDITION_TEXT } from "../rules/conditions";
import type { Band } from "../rules/types";

export interface LoadInstruction {
  taskId: string;
  title: string;
  component: string;
  band: Band | null;
  lines: string[];
  lift: { exclusionZoneM: number | null; roles: { role: string; name: string }[] } | null;
}

/** The trade's usual design figure for one person's lift close to the body (common practice). */
const ONE_PERSON_KG = 25;

export function instructionFor(task: Task, score: TaskScore, componentName: string): LoadInstruction {
  const lines: string[] = [];
  const load = score.load;
  const { niosh, filter, push, lift } = score.results;
  switch (task.operation) {
    case "lift":
      lines.push(
        `One person. Hold it close${niosh ? ` — hands no more than ${fmt(niosh.inputs.origin.h, 0)} cm in front of your feet` : ""}.`,
      );
      if (niosh)
        lines.push(
          `Lift from about ${fmt(niosh.inputs.origin.v, 0)} cm to about ${fmt(niosh.inputs.destination.v, 0)} cm; turn your feet, not your back.`,
        );
      if (niosh && niosh.inputs.frequency > 0)
        lines.push(`No more than ${fmt(Math.max(niosh.inputs.frequency, 0.2), 1)} lifts a minute.`);
      break;
    case "team-lift":
      lines.push(
        `${filter?.inputs.teamSize ?? 2}-person lift: one person calls "ready, lift"; lift and set down together.`,
      );
      if (filter) lines.push(`Each carries about ${fmt(filter.perPersonLoad, 0)} kg. Hold it close.`);
      break;
    case "carry":
      lines.push("Carry it against your body, hands at waist height.");
      if (filter?.inputs.carryDistanceM)
        lines.push(
          filter.inputs.carryDistanceM > 10
            ? `Carried about ${fmt(filter.inputs.carryDistanceM, 0)} m: put it down and rest at least every 10 m. Clear the route first.`
            : `Carried up to ${fmt(filter.inputs.carryDistanceM, 0)} m. Clear the route first.`,
        );
      break;
    case "push":
      if (push)
        lines.push(
          `${push.inputs.teamSize > 1 ? `${push.inputs.teamSize} people push` : "Push"}: start slowly, keep it moving steadily.`,
        );
      if (push && push.inputs.gradient < 0)
        lines.push("Downhill: brake on, someone at the downhill end, never let it run.");
      if (push && push.inputs.gradient > 0) lines.push("Uphill: chock the wheels whenever it stops.");
      break;
    case "equipment":
      lines.push("Lifted by the crane only — never by hand.");
      if (task.lift?.exclusionZoneM)
        lines.push(
          `Stay out of the ${fmt(task.lift.exclusionZoneM, 0)} m exclusion zone unless you are in the lift team.`,
        );
      lines.push("Only the slinger/signaller gives signals to the operator.");
      break;
  }
  for (const c of task.conditions ?? [])
    lines.push(
      `${CONDITION_TEXT[c].label[0].toUpperCase() + CONDITION_TEXT[c].label.slice(1)}: ${CONDITION_TEXT[c].controls}.`,
    );
  if (push?.runsAway && !push.inputs.braked)
    lines.push("It rolls by itself on this slope: never let go of it, and never stand below it.");
  if (load !== null && load > ONE_PERSON_KG && (task.operation === "lift" || task.operation === "carry"))
    lines.push(`Over ${ONE_PERSON_KG} kg: use the lifting aid or a second person.`);
  if (score.estimatedMass) lines.push("The weight is an estimate: treat it as heavier until it is weighed.");
  if (score.band && score.band !== "clear") {
    const first = whatIfLines(score.whatIf)[0];
    if (first) lines.push(`Not within guidance as planned. ${first}`);
  }
  if (score.band === "stop") lines.push("STOP: do not do this task as planned. Tell the person in charge.");
  const people = task.lift?.people;
  return {
    taskId: task.id,
    title: task.description || componentName,
    component: `${componentName}${load !== null ? `, ${fmt(load, 0)} kg` : ""}`,
    band: score.band,
    lines,
    lift: lift
      ? {
          exclusionZoneM: task.lift?.exclusionZoneM ?? null,
          roles: [
            { role: "Appointed person", name: people?.appointedPerson?.name ?? "" },
            { role: "Lift supervisor", name: people?.liftSupervisor?.name ?? "" },
            { role: "Operator", name: people?.operator?.name ?? "" },
            { role: "Slinger/signaller", name: people?.slingerSignaller?.name ?? "" },
          ],
        }
      : null,
  };
}

/** Working near the line and the permits, told first: how the gang is kept safe from trains. */
export interface LineBriefing {
  where: string;
  protection: string | null;
  protectionDetail: string;
  responsible: string;
  accessPoint: string;
  walkingRoute: string;
  positionsOfSafety: string;
  limits: string;
  permits: { name: string; reference: string; issuedBy: string; valid: string }[];
  digging: string[];
}

export function lineBriefing(content: Content): LineBriefing | null {
  const l = content.lineside;
  const permits = content.permits.map((p) => ({
    name: permitName(p),
    reference: p.reference,
    issuedBy: p.issuedBy,
    valid:
      p.validFrom || p.validTo
        ? `${p.validFrom ? ukDate(p.validFrom) : "…"} to ${p.validTo ? ukDate(p.validTo) : "…"}`
        : "",
  }));
  const digging: string[] = [];
  if (content.buriedServices.rule) digging.push(content.buriedServices.rule);
  if (content.excavation.present) {
    const e = content.excavation;
    if (e.support)
      digging.push(
        `Excavation${e.depthM !== null ? ` ${fmt(e.depthM, 2)} m deep` : ""}: ${SUPPORT_LABELS[e.support].toLowerCase()}${e.supportDetail ? ` — ${e.supportDetail}` : ""}.`,
      );
    if (e.edgeProtection) digging.push(e.edgeProtection);
    if (e.accessEgress) digging.push(`In and out: ${e.accessEgress}`);
  }
  if (l.nearLine === "not-near" && permits.length === 0 && digging.length === 0) return null;
  return {
    where: NEAR_LINE_LABELS[l.nearLine],
    protection: l.nearLine === "not-near" || !l.protection ? null : PROTECTION_LABELS[l.protection],
    protectionDetail: l.protectionDetail,
    responsible: [l.responsibleName, l.responsibleCompetence && `(${l.responsibleCompetence})`]
      .filter(Boolean)
      .join(" "),
    accessPoint: l.accessPoint,
    walkingRoute: l.walkingRoute,
    positionsOfSafety: l.positionsOfSafety,
    limits: l.limits,
    permits,
    digging,
  };
}

export interface BriefingScript {
  /** Protection from trains, positions of safety and permits: told before anything else. */
  line: LineBriefing | null;
  sequence: string[];
  loads: LoadInstruction[];
  hazards: { hazard: string; controls: string[] }[];
  ppe: string[];
  emergency: { nearestHospital: string; arrangements: string };
}

/** Everything the foreman reads out, in order. */
export function briefingScript(
  content: Content,
  scores: TaskScore[],
  componentNames: Record<string, string>,
): BriefingScript {
  return {
    line: lineBriefing(content),
    sequence: content.sequence.map((s) => s.text).filter(Boolean),
    loads: content.tasks.map((t, i) =>
      instructionFor(t, scores[i], (t.componentId && componentNames[t.componentId]) || "Load"),
    ),
    hazards: content.hazards.map((h) => ({ hazard: h.hazard, controls: h.controls.map((c) => c.text) })),
    ppe: content.people.ppe.filter(Boolean),
    emergency: { nearestHospital: content.emergency.nearestHospital, arrangements: content.emergency.arrangements },
  };
}
