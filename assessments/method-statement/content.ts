/**
 * The content of an assessment revision — method statement, handling tasks, hazards, people,
 * plant and PPE, emergency arrangements — as one zod schema shared by the wizard (client) and the
 * server. Drafts may be incomplete: `reviewContent` says what is still missing before submission.
 */
import { z } from "zod";
import { liftRequestSchema } from "../lift-plan/request";
import { SURFACES } from "../rules/push";
import { conditionsSchema, couplingSchema, reachSchema, sexSchema, zoneSchema } from "../rules/request";

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`);
const num = (min: number, max: number, label = "a number") =>
  z
    .number({ error: `Enter ${label}` })
    .refine(Number.isFinite, `Enter ${label}`)
    .refine((x) => x >= min && x <= max, `Must be between ${min} and ${max}`);

export const OPERATIONS = ["lift", "team-lift", "carry", "push", "equipment"] as const;
export type Operation = (typeof OPERATIONS)[number];
export const OPERATION_LABELS: Record<Operation, string> = {
  lift: "Lift or lower by one person",
  "team-lift": "Team lift",
  carry: "Carry",
  push: "Push or pull on wheels",
  equipment: "Lift with equipment",
};

/** Hand positions and rhythm for the NIOSH equation (metric: cm, lifts/min, hours). */
export const nioshInputsSchema = z.object({
  // V below 0 is below the standing surface (into an excavation): accepted, never Clear.
  origin: z.object({ h: num(0, 200, "H in cm"), v: num(-300, 250, "V in cm"), a: num(0, 180, "an angle in degrees") }),
  destination: z.object({ h: num(0, 200, "H in cm"), v: num(-300, 250, "V in cm"), a: num(0, 180, "an angle in degrees") }),
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
  teamSize: z.number({ error: "Enter the team size" }).int("Whole people only").min(1, "At least 1").max(20, "At most 20"),
  carryDistanceM: num(0, 10_000, "metres").optional(),
  durationHours: num(0.01, 24, "hours").optional(),
});

export const pushInputsSchema = z.object({
  /** The loaded trolley, barrow or case (kg) — not only the component. */
  mass: num(0.1, 100_000, "kg"),
  gradient: num(-1, 1, "a gradient (rise ÷ run)"),
  rollingCoefficient: num(0, 1, "a coefficient").optional(),
  sex: sexSchema,
  teamSize: z.number({ error: "Enter the team size" }).int("Whole people only").min(1, "At least 1").max(20, "At most 20"),
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
  quantity: z.number({ error: "Enter how many" }).int("Whole items only").min(1, "At least 1").max(50, "At most 50").default(1),
  operation: z.enum(OPERATIONS),
  niosh: nioshInputsSchema.optional(),
  filter: filterInputsSchema.optional(),
  push: pushInputsSchema.optional(),
  lift: liftPlanInputsSchema.optional(),
  /** The working environment of a handling task (not a lift with equipment). A checkbox group with
   * nothing ticked can arrive as `false` from a form: read as none. */
  conditions: z.preprocess((v) => (v === false ? [] : v), conditionsSchema.optional()),
});

export const CONTROL_LEVELS = ["eliminate", "substitute", "engineering", "administrative", "ppe"] as const;
export const CONTROL_LEVEL_LABELS: Record<(typeof CONTROL_LEVELS)[number], string> = {
  eliminate: "Eliminate",
  substitute: "Substitute",
  engineering: "Engineering control",
  administrative: "Administrative control",
  ppe: "PPE",
};
const rating = () => z.number().int().min(1, "1 to 5").max(5, "1 to 5");

export const hazardSchema = z.object({
  id: z.string().min(1).max(40),
  hazard: text(300).min(1, "Describe the hazard"),
  whoIsAtRisk: text(200),
  likelihoodBefore: rating(),
  severityBefore: rating(),
  controls: z.array(z.object({ text: text(300).min(1, "Describe the control"), level: z.enum(CONTROL_LEVELS) })).max(20),
  likelihoodAfter: rating(),
  severityAfter: rating(),
});

export const contentSchema = z.object({
  scope: z.object({
    summary: text(2000),
    startDate: z.string().regex(/^(\d{4}-\d{2}-\d{2})?$/, "Use a date").default(""),
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
  };
}

/** Risk rating of a hazard row: likelihood × severity, 1–25. */
export const riskRating = (likelihood: number, severity: number) => likelihood * severity;
