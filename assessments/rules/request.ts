/**
 * The one zod schema for scoring requests, shared by the CLI, `POST /api/v1/score` and the
 * browser's live scoring. Types and ranges only: values outside a method's range are valid requests
 * and come back with warnings (the engine never silently clamps).
 */
import { z } from "zod";
import { MAX_COMPOSITE_TASKS, MIN_COMPOSITE_TASKS } from "./niosh-composite";
import { ZONES } from "./filter";
import { SURFACES } from "./push";
import { CONDITIONS } from "./conditions";
import { liftRequestSchema } from "../lift-plan/request";

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be a finite number");
const positive = () => finite().refine((x) => x > 0, "must be greater than 0");
const nonNegative = () => finite().refine((x) => x >= 0, "must be 0 or more");
const degrees = () => nonNegative().refine((x) => x <= 180, "must be between 0 and 180 degrees");

export const sexSchema = z.enum(["male", "female"]);
export const couplingSchema = z.enum(["good", "fair", "poor"]);
export const unitsSchema = z.enum(["metric", "us"]);
export const zoneSchema = z.enum(ZONES);
export const reachSchema = z.enum(["close", "extended"]);
const teamSize = () =>
  z.number().int("must be a whole number").min(1, "must be at least 1").max(20, "must be at most 20");
const durationHours = () => positive().refine((x) => x <= 24, "must be at most 24 hours");

/** V may be negative: hands below the standing surface (an excavation), which the equation cannot judge. */
/** Working conditions present; each at most once. */
export const conditionsSchema = z
  .array(z.enum(CONDITIONS, { error: `must be one of ${CONDITIONS.join(", ")}` }))
  .max(CONDITIONS.length)
  .refine((c) => new Set(c).size === c.length, "each condition once");

export const handPositionSchema = z.strictObject({
  h: nonNegative(),
  v: finite().refine((v) => v >= -500, "must be at most 500 below the standing surface"),
  a: degrees(),
});

export const nioshRequestSchema = z.strictObject({
  method: z.literal("niosh"),
  units: unitsSchema,
  load: positive(),
  origin: handPositionSchema,
  destination: handPositionSchema,
  frequency: nonNegative(),
  durationHours: durationHours(),
  recoveryHours: nonNegative()
    .refine((x) => x <= 24, "must be at most 24 hours")
    .optional(),
  coupling: couplingSchema,
  controlAtDestination: z.boolean(),
  conditions: conditionsSchema.optional(),
});

export const compositeTaskSchema = z.strictObject({
  id: z.string().trim().min(1, "must not be empty").max(80),
  load: positive(),
  origin: handPositionSchema,
  destination: handPositionSchema,
  frequency: nonNegative(),
  coupling: couplingSchema,
  controlAtDestination: z.boolean(),
});

export const compositeRequestSchema = z.strictObject({
  method: z.literal("niosh-composite"),
  units: unitsSchema,
  durationHours: durationHours(),
  recoveryHours: nonNegative()
    .refine((x) => x <= 24, "must be at most 24 hours")
    .optional(),
  tasks: z
    .array(compositeTaskSchema)
    .min(MIN_COMPOSITE_TASKS, `a composite job needs at least ${MIN_COMPOSITE_TASKS} tasks`)
    .max(MAX_COMPOSITE_TASKS, `a composite job takes at most ${MAX_COMPOSITE_TASKS} tasks`)
    .refine((tasks) => new Set(tasks.map((t) => t.id)).size === tasks.length, "task ids must be unique"),
});

export const filterRequestSchema = z.strictObject({
  method: z.literal("filter"),
  sex: sexSchema,
  zone: zoneSchema,
  reach: reachSchema,
  load: positive(),
  frequency: nonNegative(),
  twistDeg: degrees(),
  teamSize: teamSize(),
  carryDistanceM: nonNegative().optional(),
  durationHours: durationHours().optional(),
  conditions: conditionsSchema.optional(),
});

export const pushRequestSchema = z.strictObject({
  method: z.literal("push"),
  mass: positive(),
  gradient: finite().refine((g) => Math.abs(g) <= 1, "must be between -1 and 1 (rise ÷ run)"),
  rollingCoefficient: nonNegative()
    .refine((c) => c <= 1, "must be at most 1")
    .optional(),
  sex: sexSchema,
  teamSize: teamSize(),
  distanceM: nonNegative().optional(),
  measuredForceN: positive().optional(),
  surface: z.enum(SURFACES).optional(),
  braked: z.boolean().optional(),
  brakeOperator: z.string().trim().max(120).optional(),
  conditions: conditionsSchema.optional(),
});

export const scoreRequestSchema = z.discriminatedUnion("method", [
  nioshRequestSchema,
  compositeRequestSchema,
  filterRequestSchema,
  pushRequestSchema,
  liftRequestSchema,
]);

export type ScoreRequest = z.infer<typeof scoreRequestSchema>;

export interface RequestIssue {
  path: string;
  message: string;
}

/** zod's issues as `{path, message}` with dotted paths ("origin.h", "tasks.2.load"). */
export function toIssues(error: z.ZodError): RequestIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join("."),
    message: issue.message,
  }));
}
