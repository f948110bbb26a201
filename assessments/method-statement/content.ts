/**
 * The content of an assessment revision — method statement, handling tasks, hazards, people,
 * plant and PPE, emergency arrangements — as one zod schema shared by the wizard (client) and the
 * server. Drafts may be incomplete: `reviewContent` says what is still missing before submission.
 */
import { z } from "zod";
import { liftRequestSchema } from "../lift-plan/request";
import { SURFACES } from "../rules/push";
import { conditionsSchema, couplingSchema, reachSchema, sexSchema, zoneSchema } from "../rules/request";
import {
  CONTROL_LEVELS,
  EXCAVATION_SUPPORT,
  NEAR_LINE,
  OPERATIONS,
  PERMIT_KINDS,
  PROTECTION_ARRANGEMENTS,
} from "./options";

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`);
const num = (min: number, max: number, label = "a number") =>
  z
    .number({ error: `Enter ${label}` })
    .refine(Number.isFinite, `Enter ${label}`)
    .refine((x) => x >= min && x <= max, `Must be between ${min} and ${max}`);

/** Hand positions and rhythm for the NIOSH equation (metric: cm, lifts/min, hours). */
export const nioshInputsSchema = z.object({
  // V below 0 is below the standing surface (into an excavation): accepted, never Clear.
  origin: z.object({ h: num(0, 200, "H in cm"), v: num(-300, 250, "V in cm"), a: num(0, 180, "an angle in degrees") }),
  destination: z.object({
    h: num(0, 200, "H in cm"),
    v: num(-300, 250, "V in cm"),
    a: num(0, 180, "an angle in degrees"),
  }),
  frequency: num(0, 60, "lifts per minute"),
  durationHours: num(0.01, 24, "hours"),
  /** Rest or light work after the lifting (h): decides the lifting equation's duration category. */
  recoveryHours: num(0, 24, "hours").optional(),
  coupling: couplingSchema,
  controlAtDestination: z.boolean(),
});

/** Guideline-weight filter inputs (also team lifts and carries). */
export const filterInputsSchema = z.object({
  sex: sexSchema,
  zone: zoneSchema,
  reach: reachSchema,
  frequency: num(0, 60, "operations per minute"),
  twistDeg: num(0, 180, "an angle in degrees"),
  teamSize: z
    .number({ error: "Enter the team size" })
    .int("Whole people only")
    .min(1, "At least 1")
    .max(20, "At most 20"),
  carryDistanceM: num(0, 10_000, "metres").optional(),
  durationHours: num(0.01, 24, "hours").optional(),
});

export const pushInputsSchema = z.object({
  /** The loaded trolley, barrow or case (kg) — not only the component. */
  mass: num(0.1, 100_000, "kg"),
  gradient: num(-1, 1, "a gradient (rise ÷ run)"),
  rollingCoefficient: num(0, 1, "a coefficient").optional(),
  sex: sexSchema,
  teamSize: z
    .number({ error: "Enter the team size" })
    .int("Whole people only")
    .min(1, "At least 1")
    .max(20, "At most 20"),
  distanceM: num(0, 10_000, "metres").optional(),
  measuredForceN: num(0.1, 100_000, "newtons").optional(),
  surface: z.enum(SURFACES).optional(),
  braked: z.boolean().optional(),
  brakeOperator: text(120).optional(),
});

/** A lift plan is the lift request without its method tag and load (the component's mass). */
export const liftPlanInputsSchema = liftRequestSchema.omit({ method: true, load: true });

export const taskSchema = z.object({
  id: z.string().min(1).max(40),
  description: text(300),
  componentId: z.uuid("Choose a component").nullable(),
  /** How many of the component are handled together (a bundle, a pair). */
  quantity: z
    .number({ error: "Enter how many" })
    .int("Whole items only")
    .min(1, "At least 1")
    .max(50, "At most 50")
    .default(1),
  operation: z.enum(OPERATIONS),
  niosh: nioshInputsSchema.optional(),
  filter: filterInputsSchema.optional(),
  push: pushInputsSchema.optional(),
  lift: liftPlanInputsSchema.optional(),
  /** The working environment of a handling task (not a lift with equipment). A checkbox group with
   * nothing ticked can arrive as `false` from a form: read as none. */
  conditions: z.preprocess((v) => (v === false ? [] : v), conditionsSchema.optional()),
});

const rating = () => z.number().int().min(1, "1 to 5").max(5, "1 to 5");

export const hazardSchema = z.object({
  id: z.string().min(1).max(40),
  hazard: text(300).min(1, "Describe the hazard"),
  whoIsAtRisk: text(200),
  likelihoodBefore: rating(),
  severityBefore: rating(),
  controls: z
    .array(z.object({ text: text(300).min(1, "Describe the control"), level: z.enum(CONTROL_LEVELS) }))
    .max(20),
  likelihoodAfter: rating(),
  severityAfter: rating(),
});

/** A real calendar date as YYYY-MM-DD, or blank. */
const optionalDate = () =>
  z
    .string()
    .trim()
    .refine(
      (v) => v === "" || (/^\d{4}-\d{2}-\d{2}$/.test(v) && new Date(`${v}T00:00:00Z`).toISOString().startsWith(v)),
      "Use a real date",
    )
    .default("");
/** A permit or planning reference: letters, digits and a few separators, or blank. */
const reference = () =>
  text(80)
    .refine(
      (v) => v === "" || /^[A-Za-z0-9][A-Za-z0-9 ./_:#-]*$/.test(v),
      "Use letters, digits, spaces and - / . _ : # only",
    )
    .default("");

/** Working near the line: how the gang is kept safe from trains, and who answers for it. */
export const linesideSchema = z.object({
  nearLine: z.enum(NEAR_LINE).default("not-near"),
  protection: z.enum(PROTECTION_ARRANGEMENTS).nullable().default(null),
  protectionDetail: text(1000).default(""),
  responsibleName: text(120).default(""),
  responsibleCompetence: text(120).default(""),
  planningRef: reference(),
  accessPoint: text(300).default(""),
  walkingRoute: text(1000).default(""),
  positionsOfSafety: text(1000).default(""),
  limits: text(1000).default(""),
});

export const permitSchema = z
  .object({
    kind: z.enum(PERMIT_KINDS),
    description: text(200).default(""),
    reference: reference(),
    issuedBy: text(120).default(""),
    validFrom: optionalDate(),
    validTo: optionalDate(),
  })
  .refine((p) => !p.validFrom || !p.validTo || p.validTo >= p.validFrom, {
    path: ["validTo"],
    message: "Must be on or after the start date",
  });

export const buriedServicesSchema = z.object({
  recordsObtained: z.boolean().default(false),
  recordsRef: reference(),
  scanned: z.boolean().default(false),
  scannedBy: text(120).default(""),
  scanDate: optionalDate(),
  trialHoles: text(1000).default(""),
  handDigWithinM: z
    .number({ error: "Enter metres" })
    .min(0, "0 or more")
    .max(10, "At most 10 m")
    .nullable()
    .default(null),
  rule: text(1000).default(""),
});

export const excavationSchema = z.object({
  present: z.boolean().default(false),
  depthM: z
    .number({ error: "Enter metres" })
    .min(0.05, "At least 0.05 m")
    .max(10, "At most 10 m")
    .nullable()
    .default(null),
  support: z.enum(EXCAVATION_SUPPORT).nullable().default(null),
  supportDetail: text(1000).default(""),
  edgeProtection: text(1000).default(""),
  inspection: text(1000).default(""),
  accessEgress: text(1000).default(""),
  lowering: text(1000).default(""),
});

export const environmentSchema = z.object({
  spoilAndWaste: text(1000).default(""),
  spillKit: text(500).default(""),
  backfill: text(500).default(""),
  noiseAndDust: text(1000).default(""),
  welfare: text(1000).default(""),
});

export const contentSchema = z.object({
  scope: z.object({
    summary: text(2000),
    startDate: optionalDate(),
    durationShifts: z.number().int().min(0).max(1000).default(0),
  }),
  sequence: z.array(z.object({ id: z.string().min(1).max(40), text: text(500) })).max(60),
  tasks: z.array(taskSchema).max(60),
  hazards: z.array(hazardSchema).max(60),
  people: z.object({
    roles: z.array(z.object({ role: text(80), name: text(120), competence: text(160) })).max(30),
    plant: z.array(text(160)).max(40),
    ppe: z.array(text(120)).max(40),
  }),
  emergency: z.object({
    arrangements: text(2000),
    nearestHospital: text(300),
    environment: text(2000),
  }),
  // Added for lineside work; defaults let drafts saved before them open unchanged.
  lineside: linesideSchema.default(() => linesideSchema.parse({})),
  permits: z.array(permitSchema).max(20).default([]),
  buriedServices: buriedServicesSchema.default(() => buriedServicesSchema.parse({})),
  excavation: excavationSchema.default(() => excavationSchema.parse({})),
  environment: environmentSchema.default(() => environmentSchema.parse({})),
});

export type Task = z.infer<typeof taskSchema>;
export type Hazard = z.infer<typeof hazardSchema>;
export type Content = z.infer<typeof contentSchema>;

export function emptyContent(): Content {
  return {
    scope: { summary: "", startDate: "", durationShifts: 0 },
    sequence: [],
    tasks: [],
    hazards: [],
    people: { roles: [], plant: [], ppe: [] },
    emergency: { arrangements: "", nearestHospital: "", environment: "" },
    lineside: linesideSchema.parse({}),
    permits: [],
    buriedServices: buriedServicesSchema.parse({}),
    excavation: excavationSchema.parse({}),
    environment: environmentSchema.parse({}),
  };
}
