/** The one zod schema for a lift plan, shared by the scoring CLI and API, the lift-plan form and the server. */
import { z } from "zod";
import { ACCESSORY_KINDS, COMPLEX_FACTORS, type ComplexFactor } from "./lift";
import { GROUND_TYPE_KEYS } from "./ground";
import { HITCHES, MAX_SLING_ANGLE_DEG, SINGLE_SLING_HITCHES } from "./sling";

const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be a finite number");
const mass = () => finite().refine((x) => x >= 0, "must not be negative");
const positive = () => finite().refine((x) => x > 0, "must be greater than 0");
const isoDate = () =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date as YYYY-MM-DD")
    .refine(
      (s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
      "is not a real date",
    );

export const personSchema = z.strictObject({
  name: z.string().trim().max(120),
  competenceRef: z.string().trim().max(120),
});

export const examinationSchema = z
  .strictObject({
    item: z.string().trim().min(1, "name the item").max(160),
    kind: z.enum(["equipment", "accessory", "lifts-people"]),
    lastExamined: isoDate(),
    schemeDueDate: isoDate().optional(),
  })
  .refine((e) => !e.schemeDueDate || e.schemeDueDate > e.lastExamined, {
    path: ["schemeDueDate"],
    message: "must be after the last examination",
  });

export const liftRequestSchema = z.strictObject({
  method: z.literal("lift"),
  load: positive(),
  riggingMass: mass(),
  hookBlockMass: mass(),
  ratedCapacity: positive(),
  radiusM: mass().optional(),
  maxRadiusM: positive().optional(),
  sling: z
    .strictObject({
      legs: z
        .number()
        .int("must be a whole number")
        .min(1, "a sling has 1 to 4 legs")
        .max(4, "a sling has 1 to 4 legs"),
      angleFromVerticalDeg: mass().refine(
        (a) => a <= MAX_SLING_ANGLE_DEG,
        `must be at most ${MAX_SLING_ANGLE_DEG}° from vertical: wider angles are not permitted`,
      ),
      legWll: positive(),
      hitch: z.enum(HITCHES).optional(),
      markedWll: positive().optional(),
    })
    .refine((s) => !s.hitch || !SINGLE_SLING_HITCHES.includes(s.hitch) || s.legs === 1, {
      path: ["legs"],
      message: "a basket or endless sling is one sling: 1 leg",
    }),
  factors: z
    .partialRecord(z.enum(Object.keys(COMPLEX_FACTORS) as [ComplexFactor, ...ComplexFactor[]]), z.boolean())
    .optional(),
  examinations: z.array(examinationSchema).max(20).optional(),
  liftDate: isoDate().optional(),
  wind: z
    .strictObject({ inServiceLimitMs: positive(), forecastMs: mass(), largeSailArea: z.boolean().optional() })
    .optional(),
  people: z
    .strictObject({
      appointedPerson: personSchema.optional(),
      liftSupervisor: personSchema.optional(),
      operator: personSchema.optional(),
      slingerSignaller: personSchema.optional(),
    })
    .optional(),
  exclusionZoneM: mass().optional(),
  groundBearingNotes: z.string().max(2000).optional(),
  groundBearing: z
    .strictObject({
      outriggerForceKn: positive(),
      matLengthM: positive(),
      matWidthM: positive(),
      allowableKpa: positive().optional(),
      ground: z.enum(GROUND_TYPE_KEYS, { error: "choose a ground type from the table" }).optional(),
    })
    .refine((g) => g.allowableKpa !== undefined || g.ground !== undefined, {
      path: ["allowableKpa"],
      message: "enter the allowable bearing pressure, or choose the ground type",
    })
    .optional(),
  accessories: z
    .array(
      z.strictObject({
        item: z.string().trim().min(1, "name the accessory").max(160),
        kind: z.enum(ACCESSORY_KINDS),
        wllKg: positive(),
        carries: z.enum(["whole-load", "one-leg"]),
      }),
    )
    .max(20)
    .optional(),
});
