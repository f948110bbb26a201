/**
 * "What would bring it to clear", computed rather than written: changes a practitioner could make
 * to a task are proposed and each is re-scored by the same engine (`rateTask`). Only what the
 * re-score confirms is shown, with the band it reaches, the better band first and, within a band,
 * the smallest change first. Where no single change reaches Clear (or only a lighter load does), the
 * best changes are combined (greedily, up to five); where nothing reaches Clear, the result says so and gives the best band.
 *
 * Pure, and cheap enough to run on every keystroke (`npm run bench:rules` reports the time a task).
 * The sizes used to order changes are Heftwise's own judgement of how much a change asks of a site
 * team; they order the list and decide nothing else.
 */
import { BANDS, type Band } from "../rules/types";
import { fmt } from "../rules/format";
import { MAX_TEAM_SIZE } from "../rules/team";
import { ZONES, type Zone } from "../rules/filter";
import { CONDITION_TEXT, type Condition } from "../rules/conditions";
import { MAX_ASYMMETRY_DEG, METRIC } from "../rules/niosh";
import { PUSH_DISTANCE_LIMIT_M } from "../rules/push";
import { checkExamination, type Examination } from "../lift-plan/examinations";
import { UTILISATION, WIND_MARGIN } from "../lift-plan/lift";
import { BEARING_MARGIN } from "../lift-plan/ground";
import type { Task } from "./content";
import { rateTask, type RegisterEntry, type TaskScore } from "./score-task";

type End = "origin" | "destination";

/** One change to a task, as data: `applyChange` makes it, and the stored snapshot keeps it. */
export type Change =
  | { kind: "load"; kg: number }
  | { kind: "quantity"; quantity: number }
  | { kind: "team"; people: number }
  | { kind: "pair" }
  | { kind: "reach" }
  | { kind: "zone"; zone: Zone }
  | { kind: "h"; end: End; cm: number }
  | { kind: "v"; end: End; cm: number }
  | { kind: "twist"; deg: number }
  | { kind: "frequency"; perMinute: number }
  | { kind: "recovery"; hours: number }
  | { kind: "carry"; m: number }
  | { kind: "wheel" }
  | { kind: "level" }
  | { kind: "brake" }
  | { kind: "push-mass"; kg: number }
  | { kind: "push-distance"; m: number }
  | { kind: "capacity"; kg: number }
  | { kind: "sling"; legKg: number; markedKg?: number }
  | { kind: "sling-angle"; deg: number }
  | { kind: "examine" }
  | { kind: "wind"; ms: number }
  | { kind: "radius"; m: number }
  | { kind: "condition"; condition: Condition }
  | { kind: "mat"; m: number }
  | { kind: "accessory"; index: number; kg: number };

/** Changes of one variable share a key: a combination changes each variable once. */
const changeKey = (c: Change) =>
  c.kind === "condition"
    ? `condition:${c.condition}`
    : c.kind === "h" || c.kind === "v"
      ? `${c.kind}:${c.end}`
      : c.kind === "accessory"
        ? `accessory:${c.index}`
        : c.kind;

export interface Suggestion {
  change: Change;
  text: string;
  /** The band the task reaches with this change, as re-scored. */
  band: Band;
}

export interface WhatIf {
  /** Single changes that improve the band, re-scored; better band first, then smaller change. */
  suggestions: Suggestion[];
  /** Several changes together, when no single one reaches Clear but together they improve on it. */
  together: { changes: Change[]; text: string[]; band: Band } | null;
  /** The best band any change or combination here reaches. */
  bestBand: Band;
  reachesClear: boolean;
}

/** A barrow or sack truck, for "wheel it instead of carrying it" (Heftwise assumption). */
export const BARROW_KG = 30;
const MAX_SUGGESTIONS = 6;
const rank = (band: Band) => BANDS.indexOf(band);

/** The task (and a what-if component) with one change made. */
export function applyChange(
  task: Task,
  component: RegisterEntry | undefined,
  change: Change,
): [Task, RegisterEntry | undefined] {
  const t: Task = { ...task };
  let c = component;
  switch (change.kind) {
    case "load":
      if (c) c = { ...c, massKg: change.kg / (task.quantity || 1) };
      break;
    case "quantity":
      t.quantity = change.quantity;
      break;
    case "team":
      if (t.push) t.push = { ...t.push, teamSize: change.people };
      else if (t.filter) t.filter = { ...t.filter, teamSize: change.people };
      break;
    case "pair":
      t.operation = "team-lift";
      if (t.filter)
        t.filter = {
          ...t.filter,
          teamSize: 2,
          frequency: t.niosh?.frequency ?? t.filter.frequency,
          twistDeg: t.niosh ? Math.max(t.niosh.origin.a, t.niosh.destination.a) : t.filter.twistDeg,
          carryDistanceM: undefined,
          durationHours: undefined,
        };
      break;
    case "reach":
      if (t.filter) t.filter = { ...t.filter, reach: "close" };
      break;
    case "zone":
      if (t.filter) t.filter = { ...t.filter, zone: change.zone };
      break;
    case "h":
      if (t.niosh) t.niosh = { ...t.niosh, [change.end]: { ...t.niosh[change.end], h: change.cm } };
      break;
    case "v":
      if (t.niosh) t.niosh = { ...t.niosh, [change.end]: { ...t.niosh[change.end], v: change.cm } };
      break;
    case "twist":
      if (t.niosh)
        t.niosh = {
          ...t.niosh,
          origin: { ...t.niosh.origin, a: Math.min(t.niosh.origin.a, change.deg) },
          destination: { ...t.niosh.destination, a: Math.min(t.niosh.destination.a, change.deg) },
        };
      if (t.filter) t.filter = { ...t.filter, twistDeg: Math.min(t.filter.twistDeg, change.deg) };
      break;
    case "frequency":
      if (t.niosh) t.niosh = { ...t.niosh, frequency: change.perMinute };
      if (t.filter) t.filter = { ...t.filter, frequency: change.perMinute };
      break;
    case "recovery":
      if (t.niosh) t.niosh = { ...t.niosh, recoveryHours: change.hours };
      break;
    case "carry":
      if (t.filter) t.filter = { ...t.filter, carryDistanceM: change.m };
      break;
    case "wheel":
      if (t.filter && c) {
        t.operation = "push";
        t.push = {
          mass: c.massKg * (task.quantity || 1) + BARROW_KG,
          gradient: 0,
          sex: t.filter.sex,
          teamSize: t.filter.teamSize,
          distanceM: t.filter.carryDistanceM,
          surface: "rough",
        };
      }
      break;
    case "level":
      if (t.push) t.push = { ...t.push, gradient: 0 };
      break;
    case "brake":
      if (t.push)
        t.push = { ...t.push, braked: true, brakeOperator: t.push.brakeOperator?.trim() || "named in the plan" };
      break;
    case "push-mass":
      if (t.push) t.push = { ...t.push, mass: change.kg };
      break;
    case "push-distance":
      if (t.push) t.push = { ...t.push, distanceM: change.m };
      break;
    case "capacity":
      if (t.lift) t.lift = { ...t.lift, ratedCapacity: change.kg };
      break;
    case "sling":
      if (t.lift)
        t.lift = {
          ...t.lift,
          sling: { ...t.lift.sling, legWll: change.legKg, markedWll: change.markedKg ?? t.lift.sling.markedWll },
        };
      break;
    case "sling-angle":
      if (t.lift) t.lift = { ...t.lift, sling: { ...t.lift.sling, angleFromVerticalDeg: change.deg } };
      break;
    case "examine":
      if (t.lift?.liftDate) {
        const day = t.lift.liftDate;
        t.lift = {
          ...t.lift,
          examinations: (t.lift.examinations ?? []).map((e) =>
            examinationOk(e, day) ? e : { ...e, lastExamined: day, schemeDueDate: undefined },
          ),
        };
      }
      break;
    case "wind":
      if (t.lift?.wind) t.lift = { ...t.lift, wind: { ...t.lift.wind, forecastMs: change.ms } };
      break;
    case "radius":
      if (t.lift) t.lift = { ...t.lift, radiusM: change.m };
      break;
    case "condition":
      t.conditions = (t.conditions ?? []).filter((x) => x !== change.condition);
      break;
    case "mat":
      if (t.lift?.groundBearing)
        t.lift = { ...t.lift, groundBearing: { ...t.lift.groundBearing, matLengthM: change.m, matWidthM: change.m } };
      break;
    case "accessory":
      if (t.lift?.accessories)
        t.lift = {
          ...t.lift,
          accessories: t.lift.accessories.map((a, i) => (i === change.index ? { ...a, wllKg: change.kg } : a)),
        };
      break;
  }
  return [t, c];
}

/** How much a change asks of the site team, for ordering only (Heftwise's judgement). */
function sizeOf(change: Change, task: Task, load: number): number {
  const rel = (from: number, to: number) => Math.abs(from - to) / Math.max(Math.abs(from), 1e-9);
  switch (change.kind) {
    case "load":
      return rel(load, change.kg);
    case "quantity":
      return rel(task.quantity, change.quantity);
    case "team":
      return rel(task.push?.teamSize ?? task.filter?.teamSize ?? 1, change.people);
    case "pair":
      return 1;
    case "h":
      return rel(task.niosh![change.end].h, change.cm);
    case "v":
      return Math.abs(task.niosh![change.end].v - change.cm) / 75;
    case "twist":
      return (
        (Math.max(
          task.niosh ? Math.max(task.niosh.origin.a, task.niosh.destination.a) : 0,
          task.filter?.twistDeg ?? 0,
        ) -
          change.deg) /
        180
      );
    case "frequency":
      return rel(task.niosh?.frequency ?? task.filter!.frequency, change.perMinute);
    case "carry":
      return rel(task.filter!.carryDistanceM ?? 0, change.m);
    case "push-mass":
      return rel(task.push!.mass, change.kg);
    case "capacity":
      return rel(task.lift!.ratedCapacity, change.kg);
    case "sling":
      return rel(task.lift!.sling.legWll, change.legKg);
    case "sling-angle":
      return (task.lift!.sling.angleFromVerticalDeg - change.deg) / 60;
    case "examine":
      return 0.1;
    case "recovery":
    case "push-distance":
    case "radius":
      return 0.2;
    case "reach":
    case "zone":
    case "brake":
    case "wind":
    case "condition":
    case "mat":
    case "accessory":
      return 0.3;
    case "wheel":
    case "level":
      return 0.5;
  }
}

const ZONE_PHRASES: Record<Zone, string> = {
  "below-standing-level": "below the feet",
  "floor-to-lower-leg": "between the floor and mid lower leg",
  "lower-leg-to-knuckle": "between mid lower leg and knuckle height",
  "knuckle-to-elbow": "between knuckle and elbow height",
  "elbow-to-shoulder": "between elbow and shoulder height",
  "shoulder-to-reach": "above the shoulder",
};

/** A sentence for a change, as a site team would read it. */
export function describeChange(change: Change, task: Task): string {
  switch (change.kind) {
    case "load":
      return `A lighter load: at most ${fmt(change.kg, 1)} kg (split it, or choose lighter parts)`;
    case "quantity":
      return `Handle ${change.quantity} at a time instead of ${task.quantity}`;
    case "team":
      return `A team of ${change.people} instead of ${task.push?.teamSize ?? task.filter?.teamSize ?? 1}`;
    case "pair":
      return "Lift it as a pair (a team lift)";
    case "reach":
      return "Hold the load close to the body";
    case "zone":
      if (task.filter?.zone === "below-standing-level")
        return change.zone === "floor-to-lower-leg"
          ? "Keep the hands no lower than the feet: lower from kneeling onto a mat at the edge, or pass it to a second person in the excavation"
          : `A second person standing in the excavation receives it, hands ${ZONE_PHRASES[change.zone]}`;
      return `Hands ${ZONE_PHRASES[change.zone]} (${ZONES.indexOf(change.zone) > ZONES.indexOf(task.filter?.zone ?? change.zone) ? "raise the load on a stand or bench" : "lower the shelf or stack"})`;
    case "h":
      return `Hands nearer the body at the ${change.end === "origin" ? "start" : "end"}: H ${fmt(change.cm, 0)} cm instead of ${fmt(task.niosh![change.end].h, 0)} cm`;
    case "v": {
      const from = task.niosh![change.end].v;
      const where = change.end === "origin" ? "Start" : "End";
      return from < 0
        ? `${where} at ${fmt(change.cm, 0)} cm above the standing surface, not below it: a second person in the excavation receives the load, or a tripod hoist lowers it`
        : `${where} height ${fmt(change.cm, 0)} cm instead of ${fmt(from, 0)} cm (a stand, bench or step)`;
    }
    case "twist":
      return change.deg === 0
        ? "No twisting: turn the feet, or re-arrange the workplace"
        : `Twist at most ${fmt(change.deg, 0)}° (turn the feet)`;
    case "frequency":
      return `${fmt(change.perMinute)} a minute instead of ${fmt(task.niosh?.frequency ?? task.filter!.frequency)} (share the work, or slow the pace)`;
    case "recovery":
      return `At least ${fmt(change.hours, 1)} h of rest or light work after ${fmt(task.niosh!.durationHours, 1)} h of lifting`;
    case "carry":
      return `Carry at most ${fmt(change.m, 0)} m (stage the loads nearer, or bring the van closer)`;
    case "wheel":
      return `Wheel it instead of carrying it: a barrow or sack truck (taken as ${BARROW_KG} kg, on level rough ground)`;
    case "level":
      return "A level route: avoid the gradient, or winch the load up it";
    case "brake":
      return "A trolley with a working brake, tested before use, and a named person to work it";
    case "push-mass":
      return `At most ${fmt(change.kg, 0)} kg loaded (fewer items a trip)`;
    case "push-distance":
      return `A break at least every ${fmt(change.m, 0)} m`;
    case "capacity":
      return `A machine rated at least ${fmt(change.kg, 0)} kg at this radius (or a shorter radius where it is)`;
    case "sling":
      return `A sling rated at least ${fmt(change.legKg, 0)} kg a leg${change.markedKg !== undefined ? `, the assembly marked at least ${fmt(change.markedKg, 0)} kg` : ""}`;
    case "sling-angle":
      return `Sling legs at most ${fmt(change.deg, 0)}° from vertical (longer legs, or a spreader beam)`;
    case "examine":
      return "Thorough examination in force on the lift date for every item";
    case "wind":
      return `Lift only when the wind is at most ${fmt(change.ms, 1)} m/s`;
    case "radius":
      return `A radius within the machine's maximum of ${fmt(change.m, 1)} m`;
    case "condition":
      return CONDITION_TEXT[change.condition].remedy;
    case "mat":
      return `Outrigger mats of at least ${fmt(change.m, 2)} m × ${fmt(change.m, 2)} m`;
    case "accessory":
      return `${task.lift?.accessories?.[change.index]?.item ?? "The accessory"}: one rated at least ${fmt(change.kg, 0)} kg`;
  }
}

const examinationOk = (e: Examination, liftDate: string) => checkExamination(e, liftDate).status === "in-date";

/** Candidate changes for a task, each variable's list ordered from the smallest change to the largest. */
function candidates(task: Task, score: TaskScore): Change[][] {
  const lists: Change[][] = [];
  const { niosh, filter, push, lift } = score.results;
  for (const condition of task.conditions ?? []) lists.push([{ kind: "condition", condition }]);
  const down = (from: number, to: number, steps: number) =>
    Array.from({ length: steps }, (_, i) => from - ((from - to) * (i + 1)) / steps);

  if (task.quantity > 1)
    lists.push(
      Array.from({ length: task.quantity - 1 }, (_, i) => ({ kind: "quantity", quantity: task.quantity - 1 - i })),
    );
  if (task.operation === "lift" && task.filter) lists.push([{ kind: "pair" }]);
  const team = push?.inputs.teamSize ?? (task.operation !== "lift" ? filter?.inputs.teamSize : undefined);
  if (team !== undefined && team < MAX_TEAM_SIZE)
    lists.push(Array.from({ length: MAX_TEAM_SIZE - team }, (_, i) => ({ kind: "team", people: team + 1 + i })));

  if (niosh) {
    const frequency = niosh.inputs.frequency;
    for (const end of ["origin", "destination"] as const) {
      const pos = niosh.inputs[end];
      if (pos.h > METRIC.hMin) {
        // Beyond the equation's reach, its limit is the first thing to try.
        const from = Math.min(pos.h, METRIC.hMax);
        lists.push(
          [...(pos.h > METRIC.hMax ? [METRIC.hMax] : []), ...down(from, METRIC.hMin, 8).map(Math.floor)]
            .filter((cm, i, all) => cm < pos.h && all.indexOf(cm) === i)
            .map((cm) => ({ kind: "h", end, cm })),
        );
      }
      if (pos.v !== METRIC.vOptimum) {
        const start = pos.v < 0 ? 0 : pos.v;
        const steps = [pos.v < 0 ? [0] : [], down(start, METRIC.vOptimum, 5)].flat();
        lists.push(steps.map((cm) => ({ kind: "v", end, cm: Math.round(cm) })));
      }
    }
    const twist = Math.max(niosh.inputs.origin.a, niosh.inputs.destination.a);
    if (twist > 0)
      lists.push(
        [...(twist > MAX_ASYMMETRY_DEG ? [MAX_ASYMMETRY_DEG] : []), 90, 45, 30, 0]
          .filter((d) => d < twist)
          .map((deg) => ({ kind: "twist", deg })),
      );
    if (frequency > 0.2)
      lists.push(
        [12, 10, 8, 6, 5, 4, 3, 2, 1, 0.5, 0.2]
          .filter((f) => f < frequency)
          .map((perMinute) => ({ kind: "frequency", perMinute })),
      );
    const d = niosh.inputs.durationHours;
    if (d <= 2 && niosh.derived.durationBand !== (d <= 1 ? "short" : "moderate"))
      lists.push([{ kind: "recovery", hours: Math.ceil((d <= 1 ? 1.2 : 0.3) * d * 10) / 10 }]);
  }
  if (filter) {
    const f = filter.inputs;
    if (f.reach === "extended") lists.push([{ kind: "reach" }]);
    const at = ZONES.indexOf(f.zone);
    const best = ZONES.indexOf("knuckle-to-elbow");
    if (at !== best) {
      const path: Zone[] = [];
      for (let i = at + Math.sign(best - at); i !== best + Math.sign(best - at); i += Math.sign(best - at))
        path.push(ZONES[i]);
      lists.push(path.map((zone) => ({ kind: "zone", zone })));
    }
    if (!niosh) {
      if (f.twistDeg > 0) lists.push([90, 45, 0].filter((d) => d < f.twistDeg).map((deg) => ({ kind: "twist", deg })));
      if (f.frequency > 0.5)
        lists.push([8, 2, 0.5].filter((x) => x < f.frequency).map((perMinute) => ({ kind: "frequency", perMinute })));
    }
    if (f.carryDistanceM !== undefined && f.carryDistanceM > 0) {
      lists.push([20, 10, 5].filter((m) => m < f.carryDistanceM!).map((m) => ({ kind: "carry", m })));
      lists.push([{ kind: "wheel" }]);
    }
  }
  if (push) {
    const p = push.inputs;
    if (p.gradient !== 0) lists.push([{ kind: "level" }]);
    if (push.forceSource === "estimated")
      lists.push([0.75, 0.5, 0.25].map((k) => ({ kind: "push-mass", kg: Math.floor(p.mass * k) })));
    if (!p.braked && push.runsAway) lists.push([{ kind: "brake" }]);
    if (p.distanceM !== undefined && p.distanceM > PUSH_DISTANCE_LIMIT_M)
      lists.push([{ kind: "push-distance", m: PUSH_DISTANCE_LIMIT_M }]);
  }
  if (lift) {
    const l = lift.inputs;
    if (lift.utilisation > UTILISATION.clearUpTo)
      lists.push([{ kind: "capacity", kg: Math.ceil(lift.hookLoad / UTILISATION.clearUpTo / 10) * 10 }]);
    if (!lift.slingOk) {
      // Each leg at the tension it carries, the assembly at the load it carries, both rounded up.
      const legKg =
        Math.ceil(
          Math.max(lift.legTension / (l.sling.hitch === "choked" ? 0.8 : 1), lift.slingLoad / lift.modeFactor) / 10,
        ) * 10;
      lists.push([
        {
          kind: "sling",
          legKg,
          markedKg: l.sling.markedWll !== undefined ? Math.ceil(lift.slingLoad / 10) * 10 : undefined,
        },
      ]);
      if (l.sling.legs > 1 && l.sling.angleFromVerticalDeg > 30)
        lists.push(
          [45, 30].filter((d) => d < l.sling.angleFromVerticalDeg).map((deg) => ({ kind: "sling-angle", deg })),
        );
    }
    if (lift.examinations.some((e) => e.status !== "in-date")) lists.push([{ kind: "examine" }]);
    if (l.wind && l.wind.forecastMs > l.wind.inServiceLimitMs * WIND_MARGIN)
      lists.push([{ kind: "wind", ms: Math.floor(l.wind.inServiceLimitMs * WIND_MARGIN * 10) / 10 }]);
    if (l.radiusM !== undefined && l.maxRadiusM !== undefined && l.radiusM > l.maxRadiusM)
      lists.push([{ kind: "radius", m: l.maxRadiusM }]);
    const g = lift.ground;
    if (g && l.groundBearing && g.allowableKpa && g.ratio! > BEARING_MARGIN)
      lists.push([
        {
          kind: "mat",
          m: Math.ceil(Math.sqrt(l.groundBearing.outriggerForceKn / (g.allowableKpa * BEARING_MARGIN)) * 20) / 20,
        },
      ]);
    lift.accessoryChecks.forEach((a, index) => {
      if (!a.ok) lists.push([{ kind: "accessory", index, kg: Math.ceil(a.carriesKg / 10) * 10 }]);
    });
  }
  return lists.filter((list) => list.length > 0);
}

interface Found {
  change: Change;
  band: Band;
  size: number;
}

/** The first change in each list that reaches Clear, or failing that the smallest change reaching the best band it can. */
function bestOfEachList(task: Task, component: RegisterEntry | undefined, score: TaskScore): Found[] {
  const current = rank(score.band!);
  const load = score.load ?? 0;
  const found: Found[] = [];
  for (const list of candidates(task, score)) {
    let best: Found | null = null;
    for (const change of list) {
      const band = rateTask(...applyChange(task, component, change)).band;
      if (band === null || rank(band) >= current) continue;
      if (!best || rank(band) < rank(best.band)) best = { change, band, size: sizeOf(change, task, load) };
      if (band === "clear") break;
    }
    if (best) found.push(best);
  }
  const lighter = lighterLoad(task, component, score);
  if (lighter) found.push(lighter);
  return found;
}

/** The heaviest load (to 0.1 kg) that reaches the best band a lighter load can, by bisection on the engine. */
function lighterLoad(task: Task, component: RegisterEntry | undefined, score: TaskScore): Found | null {
  if (!component || score.load === null || task.operation === "push" || task.operation === "equipment") return null;
  const bandAt = (kg: number) => rateTask(...applyChange(task, component, { kind: "load", kg })).band!;
  const floor = score.load * 0.05;
  const target = bandAt(floor);
  if (rank(target) >= rank(score.band!)) return null;
  let lo = floor;
  let hi = score.load;
  for (let i = 0; i < 14; i++) {
    const mid = (lo + hi) / 2;
    if (rank(bandAt(mid)) <= rank(target)) lo = mid;
    else hi = mid;
  }
  const kg = Math.floor(lo * 10) / 10;
  if (kg <= 0) return null;
  const band = bandAt(kg);
  return rank(band) <= rank(target)
    ? { change: { kind: "load", kg }, band, size: (score.load - kg) / score.load }
    : null;
}

/**
 * Band first, then how many things hold the band up (warnings and working conditions), then the
 * largest index of the methods: a finer measure than the band for combining changes.
 */
type Pressure = [number, number, number];
function pressure(task: Task, score: TaskScore): Pressure {
  let worst = 0;
  let holding = task.conditions?.length ?? 0;
  for (const r of Object.values(score.results)) {
    worst = Math.max(worst, r.index ?? Infinity);
    holding += r.warnings.length;
  }
  return [rank(score.band ?? "stop"), holding, worst];
}
const lower = (a: Pressure, b: Pressure) =>
  a[0] < b[0] || (a[0] === b[0] && (a[1] < b[1] || (a[1] === b[1] && a[2] < b[2])));

const MAX_COMBINED = 5;

/**
 * Changes combined when no single one reaches Clear: greedily, each step the strongest option of
 * each variable, kept when it lowers the measure above; then each change the result does not need
 * is dropped, and each one left is shrunk back to the smallest option of its variable that keeps
 * the band reached.
 */
function combine(task: Task, component: RegisterEntry | undefined, score: TaskScore): WhatIf["together"] {
  const chosen: { list: Change[]; at: number }[] = [];
  let t = task;
  let c = component;
  let s = score;
  for (let step = 0; step < MAX_COMBINED && s.band !== "clear"; step++) {
    let best: { list: Change[]; score: TaskScore; pressure: Pressure } | null = null;
    const now = pressure(t, s);
    for (const list of candidates(t, s)) {
      const strongest = list[list.length - 1];
      if (chosen.some((x) => changeKey(x.list[0]) === changeKey(strongest))) continue;
      const [nt, nc] = applyChange(t, c, strongest);
      const next = rateTask(nt, nc);
      const p = pressure(nt, next);
      if (next.band !== null && lower(p, best?.pressure ?? now)) best = { list, score: next, pressure: p };
    }
    if (!best) break;
    chosen.push({ list: best.list, at: best.list.length - 1 });
    [t, c] = applyChange(t, c, best.list[best.list.length - 1]);
    s = best.score;
  }
  if (chosen.length < 2 || s.band === null || rank(s.band) >= rank(score.band!)) return null;
  const reached = s.band;
  const applyAll = () => {
    let applied: [Task, RegisterEntry | undefined] = [task, component];
    for (const x of chosen) applied = applyChange(...applied, x.list[x.at]);
    return rank(rateTask(...applied).band ?? "stop");
  };
  for (let i = chosen.length - 1; i >= 0 && chosen.length > 1; i--) {
    const [dropped] = chosen.splice(i, 1);
    if (applyAll() > rank(reached)) chosen.splice(i, 0, dropped);
  }
  if (chosen.length < 2) return null;
  for (const x of chosen) {
    const keep = x.at;
    for (let i = 0; i < keep; i++) {
      x.at = i;
      if (applyAll() <= rank(reached)) break;
      x.at = keep;
    }
  }
  const changes = chosen.map((x) => x.list[x.at]);
  const text: string[] = [];
  let applied: [Task, RegisterEntry | undefined] = [task, component];
  for (const change of changes) {
    text.push(describeChange(change, applied[0]));
    applied = applyChange(...applied, change);
  }
  return { changes, text, band: rateTask(...applied).band! };
}

export function solveForClear(task: Task, component: RegisterEntry | undefined, score: TaskScore): WhatIf | undefined {
  if (score.band === null) return undefined;
  if (score.band === "clear") return { suggestions: [], together: null, bestBand: "clear", reachesClear: true };

  const found = bestOfEachList(task, component, score).sort((a, b) => rank(a.band) - rank(b.band) || a.size - b.size);
  const suggestions = found
    .slice(0, MAX_SUGGESTIONS)
    .map((f) => ({ change: f.change, text: describeChange(f.change, task), band: f.band }));
  let bestBand: Band = found.length ? found[0].band : score.band;
  // Combine where no single change reaches Clear, or only cutting the load does (the part may not split).
  let together: WhatIf["together"] = null;
  const otherBest = found.find((f) => f.change.kind !== "load")?.band ?? score.band;
  if (otherBest !== "clear") {
    together = combine(task, component, score);
    if (together && rank(together.band) < rank(otherBest))
      bestBand = rank(together.band) < rank(bestBand) ? together.band : bestBand;
    else together = null;
  }
  return { suggestions, together, bestBand, reachesClear: bestBand === "clear" };
}

const label = (band: Band) => band[0].toUpperCase() + band.slice(1);

/**
 * The what-if as plain lines (pack, briefing): each confirmed change with the band it reaches, the
 * combination, and — where nothing reaches Clear — that, with the best band.
 */
export function whatIfLines(whatIf: WhatIf | undefined): string[] {
  // Nothing to say only for a task that is Clear already.
  if (!whatIf || (whatIf.suggestions.length === 0 && !whatIf.together && whatIf.reachesClear)) return [];
  const lines = whatIf.suggestions.map((s) => `${s.text}: ${label(s.band)}.`);
  if (whatIf.together) lines.push(`Together — ${whatIf.together.text.join("; ")}: ${label(whatIf.together.band)}.`);
  if (!whatIf.reachesClear) lines.push(nothingReachesClear(whatIf.bestBand));
  return lines;
}

export function nothingReachesClear(best: Band): string {
  return `No change Heftwise can score brings this task to Clear; the best reached is ${label(best)}. Consider a mechanical aid and plan it as a lift with equipment.`;
}
