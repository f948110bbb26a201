/**
 * A lift made with lifting equipment (LOLER 1998 reg. 8; BS 7121-1): hook load, equipment
 * utilisation, sling check, lift category, thorough examinations, wind, and the people BS 7121 names.
 * Pure TypeScript, like the rules engine: the browser scores a plan as it is typed.
 */
import { worstBand } from "../rules/bands";
import { fmt } from "../rules/format";
import type { Band, Reason, ResultBase, Warning } from "../rules/types";
import { RULES_VERSION } from "../rules/version";
import { checkExamination, type Examination, type ExaminationResult } from "./examinations";
import {
  BEARING_MARGIN,
  checkGroundBearing,
  GROUND_SOURCE,
  GROUND_TYPES,
  type GroundBearing,
  type GroundBearingResult,
} from "./ground";
import {
  CHOKE_FACTOR,
  HITCH_LABELS,
  legsSharing,
  legTension,
  modeFactor,
  SINGLE_SLING_HITCHES,
  type Hitch,
} from "./sling";

export const LIFT_SOURCES = {
  loler: "LOLER 1998 reg. 8 (planning) and reg. 9 (thorough examination; intervals from memory)",
  bs7121: "BS 7121-1:2016, Code of practice for safe use of cranes",
  sling: "EN 818-4 uniform-load method, mode factors as published in suppliers' tables",
  hitches:
    "Choked, basket and endless mode factors as tabled in EN 1492-1 and EN 818-4 suppliers' tables (from memory)",
  policy: "Heftwise policy (see DEVELOPERS.md, Lift plan policy); no published source",
} as const;

/** Answers that make a lift complex (BS 7121 planning; categories as commonly described). */
export const COMPLEX_FACTORS = {
  tandem: "tandem lift (two machines share the load)",
  blind: "blind lift (the operator cannot see the load)",
  overPeople: "load passes over people or occupied areas",
  nearOverheadLines: "near overhead lines or overhead line equipment",
  nearOpenLine: "beside a line open to traffic or a live road",
  uncertainCentreOfGravity: "centre of gravity uncertain",
  nightWork: "night work",
  restrictedSite: "restricted site",
} as const;
export type ComplexFactor = keyof typeof COMPLEX_FACTORS;

/** Heftwise policy thresholds for equipment utilisation (fraction of rated capacity at the radius). */
export const UTILISATION = {
  clearUpTo: 0.75,
  watchUpTo: 0.9,
  actUpTo: 1.0,
  standardAbove: 0.5,
  complexAbove: 0.9,
} as const;
/** Heftwise policy: a forecast above 80 % of the in-service wind limit is flagged. */
export const WIND_MARGIN = 0.8;

export interface Person {
  name: string;
  competenceRef: string;
}

export interface LiftRequest {
  method: "lift";
  /** Mass of the load (kg). */
  load: number;
  /** Slings, shackles, spreader or lifting beam (kg). */
  riggingMass: number;
  hookBlockMass: number;
  /** Rated capacity at the planned radius, from the maker's chart (kg). */
  ratedCapacity: number;
  radiusM?: number;
  maxRadiusM?: number;
  /** `markedWll`: the working load limit marked on the assembly for this hitch and angle (kg). */
  sling: { legs: number; angleFromVerticalDeg: number; legWll: number; hitch?: Hitch; markedWll?: number };
  factors?: Partial<Record<ComplexFactor, boolean>>;
  examinations?: Examination[];
  /** ISO date of the planned lift; needed to check examinations. */
  liftDate?: string;
  wind?: { inServiceLimitMs: number; forecastMs: number; largeSailArea?: boolean };
  people?: Partial<Record<"appointedPerson" | "liftSupervisor" | "operator" | "slingerSignaller", Person>>;
  exclusionZoneM?: number;
  groundBearingNotes?: string;
  /** Outrigger force on its mat and the ground under it. */
  groundBearing?: GroundBearing;
  /** Shackles, lifting beams, rail clamps and the like, each checked against what it carries. */
  accessories?: Accessory[];
}

export const ACCESSORY_KINDS = ["shackle", "lifting-beam", "spreader", "rail-clamp", "eyebolt", "other"] as const;
export interface Accessory {
  item: string;
  kind: (typeof ACCESSORY_KINDS)[number];
  wllKg: number;
  /** "whole-load": at the hook or under it (the sling load); "one-leg": in one leg (the leg tension). */
  carries: "whole-load" | "one-leg";
}

export interface LiftResult extends ResultBase {
  method: "lift";
  inputs: LiftRequest;
  hookLoad: number;
  /** What the sling carries: the load and the rigging below the hook (kg). */
  slingLoad: number;
  utilisation: number;
  legTension: number;
  legsSharing: number;
  modeFactor: number;
  /** Leg WLL × mode factor (kg). */
  computedSlingWll: number;
  /** Rated capacity of the sling assembly: the lower of the computed and the marked limit (kg). */
  slingWll: number;
  slingOk: boolean;
  category: "basic" | "standard" | "complex";
  categoryReasons: string[];
  examinations: ExaminationResult[];
  /** What must be added before the plan can be approved. */
  missing: string[];
  ground: GroundBearingResult | null;
  /** Pressure under the outrigger mat (kPa), when the ground bearing is entered. */
  groundPressureKpa: number | null;
  accessoryChecks: { item: string; carriesKg: number; wllKg: number; ok: boolean }[];
  limit: number;
  index: number;
}

const ROLE_LABELS = {
  appointedPerson: "appointed person",
  liftSupervisor: "lift supervisor",
  operator: "operator",
  slingerSignaller: "slinger/signaller",
} as const;

export function scoreLift(req: LiftRequest): LiftResult {
  const hitch = req.sling.hitch ?? "straight";
  const hookLoad = req.load + req.riggingMass + req.hookBlockMass;
  const slingLoad = req.load + req.riggingMass;
  const utilisation = hookLoad / req.ratedCapacity;
  const factor = modeFactor(req.sling.legs, req.sling.angleFromVerticalDeg, hitch);
  const computedSlingWll = req.sling.legWll * factor;
  const marked = req.sling.markedWll;
  const slingWll = marked !== undefined ? Math.min(computedSlingWll, marked) : computedSlingWll;
  const tension = legTension(slingLoad, req.sling.legs, req.sling.angleFromVerticalDeg, hitch);
  // Each leg of a multi-leg assembly is checked too; a single sling (basket, endless) by its assembly limit.
  const singleSling = SINGLE_SLING_HITCHES.includes(hitch);
  const legLimit = singleSling ? Infinity : req.sling.legWll * (hitch === "choked" ? CHOKE_FACTOR : 1);
  const slingOk = slingLoad <= slingWll && tension <= legLimit;

  const reasons: Reason[] = [];
  const warnings: Warning[] = [];
  const bands: Band[] = [];

  // Equipment
  const utilisationBand: Band =
    utilisation <= UTILISATION.clearUpTo
      ? "clear"
      : utilisation <= UTILISATION.watchUpTo
        ? "watch"
        : utilisation <= UTILISATION.actUpTo
          ? "act"
          : "stop";
  bands.push(utilisationBand);
  reasons.push({
    text: `Hook load ${fmt(hookLoad)} kg (load ${fmt(req.load)} + rigging ${fmt(req.riggingMass)} + hook block ${fmt(req.hookBlockMass)}) is ${fmt(utilisation * 100, 0)} % of the rated capacity of ${fmt(req.ratedCapacity)} kg${req.radiusM !== undefined ? ` at ${fmt(req.radiusM, 1)} m` : ""}.`,
    source: `${LIFT_SOURCES.bs7121}; bands by utilisation: ${LIFT_SOURCES.policy}`,
  });
  if (utilisation > UTILISATION.actUpTo)
    warnings.push({
      field: "ratedCapacity",
      message:
        "The hook load exceeds the rated capacity at this radius: do not lift. Use a bigger machine or a shorter radius.",
    });
  else if (utilisation > UTILISATION.watchUpTo)
    warnings.push({
      field: "ratedCapacity",
      message: `Above ${fmt(UTILISATION.watchUpTo * 100, 0)} % of rated capacity: little margin for a wrong weight or radius. Confirm both.`,
    });
  if (req.radiusM !== undefined && req.maxRadiusM !== undefined && req.radiusM > req.maxRadiusM) {
    bands.push("stop");
    warnings.push({
      field: "radiusM",
      message: `The planned radius ${fmt(req.radiusM, 1)} m is beyond the machine's maximum radius of ${fmt(req.maxRadiusM, 1)} m.`,
    });
  }

  // Sling
  const parts = legsSharing(req.sling.legs, hitch);
  reasons.push({
    text: `${singleSling ? "One sling" : `${req.sling.legs}-leg sling`}, ${HITCH_LABELS[hitch]}, ${fmt(req.sling.angleFromVerticalDeg, 1)}° from vertical: ${parts} ${singleSling ? "parts" : "leg(s)"} share ${fmt(slingLoad)} kg, ${fmt(tension)} kg each; mode factor ${fmt(factor)} × ${fmt(req.sling.legWll)} kg = ${fmt(computedSlingWll)} kg${marked !== undefined ? `, marked ${fmt(marked)} kg: the assembly is rated ${fmt(slingWll)} kg (the lower governs)` : ""}.`,
    source: hitch === "straight" ? LIFT_SOURCES.sling : `${LIFT_SOURCES.sling}; ${LIFT_SOURCES.hitches}`,
  });
  if (marked === undefined)
    warnings.push({
      field: "sling.markedWll",
      message:
        "Enter the working load limit marked on the sling assembly: published tables round down, so the marked limit can be lower than the computed one.",
    });
  if (!slingOk) {
    bands.push("stop");
    warnings.push({
      field: "sling.legWll",
      message:
        tension > legLimit
          ? `Leg tension ${fmt(tension)} kg exceeds the leg's working load limit of ${fmt(legLimit)} kg.`
          : `The load of ${fmt(slingLoad)} kg exceeds the sling assembly's rated capacity of ${fmt(slingWll)} kg.`,
    });
  }

  // Examinations
  const examinations = req.liftDate ? (req.examinations ?? []).map((e) => checkExamination(e, req.liftDate!)) : [];
  examinations.forEach((e, i) => {
    if (e.status === "expired") {
      bands.push("stop");
      warnings.push({
        field: `examinations.${i}.lastExamined`,
        message: `${e.item}: thorough examination due ${e.dueDate}, before the lift on ${req.liftDate}. It must be examined before use.`,
      });
    } else if (e.status === "after-lift") {
      bands.push("stop");
      warnings.push({
        field: `examinations.${i}.lastExamined`,
        message: `${e.item}: examined ${e.lastExamined}, after the lift on ${req.liftDate}, so it cannot cover the lift. Enter the examination in force on the lift date.`,
        cannotJudge: true,
      });
    } else if (e.status === "due-soon") {
      bands.push("watch");
      warnings.push({
        field: `examinations.${i}.lastExamined`,
        message: `${e.item}: thorough examination due ${e.dueDate}, soon after the lift. Check the report is on site.`,
      });
    }
  });
  if (examinations.length)
    reasons.push({
      text: `Thorough examinations checked against the lift date ${req.liftDate}: ${examinations.filter((e) => e.status === "in-date" || e.status === "due-soon").length} of ${examinations.length} in date.`,
      source: LIFT_SOURCES.loler,
    });

  // Wind
  if (req.wind) {
    const ratio = req.wind.forecastMs / req.wind.inServiceLimitMs;
    if (ratio > 1) {
      bands.push("stop");
      warnings.push({
        field: "wind.forecastMs",
        message: `Forecast ${fmt(req.wind.forecastMs, 1)} m/s is above the in-service limit of ${fmt(req.wind.inServiceLimitMs, 1)} m/s: do not lift.`,
      });
    } else if (ratio > WIND_MARGIN) {
      bands.push("watch");
      warnings.push({
        field: "wind.forecastMs",
        message: `Forecast ${fmt(req.wind.forecastMs, 1)} m/s is close to the in-service limit: measure the wind at the lift and stop above the limit.`,
      });
    }
    if (req.wind.largeSailArea)
      warnings.push({
        field: "wind.largeSailArea",
        message:
          "The load has a large sail area: the maker's limit may be down-rated for it (BS 7121-1 Annex D). Use the down-rated figure.",
      });
    reasons.push({
      text: `Wind: forecast ${fmt(req.wind.forecastMs, 1)} m/s against the maker's in-service limit of ${fmt(req.wind.inServiceLimitMs, 1)} m/s.`,
      source: LIFT_SOURCES.bs7121,
    });
  }

  // Ground bearing under the outrigger mat
  const ground = req.groundBearing ? checkGroundBearing(req.groundBearing) : null;
  if (req.groundBearing && ground) {
    const g = req.groundBearing;
    const type = g.ground ? GROUND_TYPES[g.ground] : null;
    if (ground.allowableKpa === null) {
      bands.push("stop");
      warnings.push({
        field: "groundBearing.allowableKpa",
        message: `No presumed bearing value for ${type?.label ?? "this ground"} (${type?.range ?? "not stated"}): enter an allowable bearing pressure from a ground investigation, or improve the ground. The ground cannot be judged without it.`,
        cannotJudge: true,
      });
    } else {
      const ratio = ground.ratio!;
      bands.push(ratio <= BEARING_MARGIN ? "clear" : ratio <= 1 ? "watch" : "stop");
      if (ratio > 1)
        warnings.push({
          field: "groundBearing.matLengthM",
          message: `Ground pressure ${fmt(ground.pressureKpa, 0)} kPa exceeds the allowable ${fmt(ground.allowableKpa, 0)} kPa: use mats of at least ${fmt(ground.smallestSquareMatM!, 2)} m × ${fmt(ground.smallestSquareMatM!, 2)} m, or improve the ground.`,
        });
      else if (ratio > BEARING_MARGIN)
        warnings.push({
          field: "groundBearing.matLengthM",
          message: `Ground pressure is ${fmt(ratio * 100, 0)} % of the allowable: little margin. Set the mats level on firm ground with no voids, or use larger mats.`,
        });
      if (g.allowableKpa !== undefined && type && type.presumedKpa !== null && g.allowableKpa > type.presumedKpa * 2)
        warnings.push({
          field: "groundBearing.allowableKpa",
          message: `The allowable ${fmt(g.allowableKpa, 0)} kPa entered is well above the presumed value for ${type.label} (${type.range}): keep the ground investigation that supports it with the plan.`,
        });
    }
    reasons.push({
      text: `Outrigger force ${fmt(g.outriggerForceKn, 1)} kN on a ${fmt(g.matLengthM, 2)} m × ${fmt(g.matWidthM, 2)} m mat: ${fmt(ground.pressureKpa, 0)} kPa${
        ground.allowableKpa !== null
          ? ` against an allowable ${fmt(ground.allowableKpa, 0)} kPa (${ground.allowableFrom === "entered" ? "entered by the planner" : `presumed for ${type!.label}`}); the smallest square mat within it is ${fmt(ground.smallestSquareMatM!, 2)} m`
          : ""
      }.`,
      source: `${ground.allowableFrom === "presumed" ? GROUND_SOURCE : "Pressure = force ÷ mat area (mechanics); allowable entered by the planner"}; bands: ${LIFT_SOURCES.policy}`,
    });
  }

  // Accessories, each against what it carries
  const accessoryChecks = (req.accessories ?? []).map((a) => {
    const carriesKg = a.carries === "whole-load" ? slingLoad : tension;
    return { item: a.item, carriesKg, wllKg: a.wllKg, ok: carriesKg <= a.wllKg };
  });
  accessoryChecks.forEach((a, i) => {
    if (!a.ok) {
      bands.push("stop");
      warnings.push({
        field: `accessories.${i}.wllKg`,
        message: `${a.item} carries ${fmt(a.carriesKg, 0)} kg, above its working load limit of ${fmt(a.wllKg, 0)} kg.`,
      });
    }
  });
  if (accessoryChecks.length)
    reasons.push({
      text: `Accessories: ${accessoryChecks.map((a) => `${a.item} carries ${fmt(a.carriesKg, 0)} kg of its ${fmt(a.wllKg, 0)} kg WLL${a.ok ? "" : " — OVER"}`).join("; ")}.`,
      source: LIFT_SOURCES.bs7121,
    });

  // Category
  const categoryReasons: string[] = (Object.keys(COMPLEX_FACTORS) as ComplexFactor[])
    .filter((f) => req.factors?.[f])
    .map((f) => COMPLEX_FACTORS[f]);
  if (utilisation > UTILISATION.complexAbove)
    categoryReasons.push(`utilisation above ${fmt(UTILISATION.complexAbove * 100, 0)} % of rated capacity`);
  let category: LiftResult["category"] = "complex";
  if (categoryReasons.length === 0) {
    const standardReasons: string[] = [];
    if (utilisation > UTILISATION.standardAbove)
      standardReasons.push(`utilisation above ${fmt(UTILISATION.standardAbove * 100, 0)} %`);
    if (req.sling.legs > 1 && req.sling.angleFromVerticalDeg > 45)
      standardReasons.push("sling legs wider than 45° from vertical");
    if (req.wind && req.wind.forecastMs > req.wind.inServiceLimitMs * 0.5)
      standardReasons.push("forecast wind above half the in-service limit");
    category = standardReasons.length ? "standard" : "basic";
    categoryReasons.push(
      ...(standardReasons.length ? standardReasons : ["light lift, good margins, no complicating factor"]),
    );
  }
  reasons.push({
    text: `Lift category ${category}: ${categoryReasons.join("; ")}.`,
    source: `${LIFT_SOURCES.bs7121}; thresholds: ${LIFT_SOURCES.policy}`,
  });

  // People
  const missing: string[] = [];
  for (const role of Object.keys(ROLE_LABELS) as (keyof typeof ROLE_LABELS)[]) {
    const person = req.people?.[role];
    if (!person?.name?.trim()) missing.push(ROLE_LABELS[role]);
  }
  if (missing.includes("appointed person"))
    warnings.push({
      field: "people.appointedPerson",
      message:
        "No appointed person: the plan cannot be approved until a competent person is appointed to plan the lift.",
    });
  if (!req.liftDate && req.examinations?.length)
    warnings.push({ field: "liftDate", message: "No lift date: thorough examinations cannot be checked." });
  if (!req.examinations?.length) missing.push("thorough examination records");
  if (marked === undefined) missing.push("working load limit marked on the sling assembly");
  if (!req.groundBearing) missing.push("ground bearing check (outrigger force and mat size)");

  return {
    method: "lift",
    inputs: req,
    hookLoad,
    slingLoad,
    utilisation,
    legTension: tension,
    legsSharing: parts,
    modeFactor: factor,
    computedSlingWll,
    slingWll,
    slingOk,
    category,
    categoryReasons,
    examinations,
    missing,
    ground,
    groundPressureKpa: ground?.pressureKpa ?? null,
    accessoryChecks,
    limit: req.ratedCapacity,
    index: utilisation,
    band: worstBand(bands),
    reasons,
    warnings,
    rulesVersion: RULES_VERSION,
  };
}
