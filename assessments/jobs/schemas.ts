import { z } from "zod";
import { normaliseMileage } from "@/lib/mileage";

const optional = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters`)
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional();

/** A job: one schema for the form and the server. Railway fields are optional (civils sites have none). */
export const jobSchema = z.object({
  name: z.string().trim().min(3, "Name the job").max(200, "Use at most 200 characters"),
  client: z.string().trim().min(2, "Name the client").max(200, "Use at most 200 characters"),
  location: z.string().trim().min(2, "Say where the work is").max(300, "Use at most 300 characters"),
  lineReference: optional(120),
  /** Shown and stored in one form (lib/mileage.ts), so "14m22ch" and "14 miles 22 chains" read alike. */
  mileage: z
    .string()
    .trim()
    .max(60, "Use at most 60 characters")
    .refine(
      (v) => v === "" || normaliseMileage(v) !== null,
      "Write the mileage in miles and chains, e.g. 14m 22ch (80 chains to the mile), or a stretch 17m 05ch – 17m 15ch",
    )
    .transform((v) => (v === "" ? null : normaliseMileage(v)))
    .nullable()
    .optional(),
  accessPoint: optional(300),
  nearestHospital: optional(300),
  emergencyArrangements: optional(2000),
  siteContactName: optional(120),
  siteContactPhone: z
    .string()
    .trim()
    .max(40)
    .refine((v) => v === "" || /^[+0-9 ()-]{6,40}$/.test(v), "Enter a phone number (digits, spaces, + and brackets)")
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional(),
});

export type JobInput = z.input<typeof jobSchema>;
