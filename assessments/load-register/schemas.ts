import { z } from "zod";

const dimension = z
  .number({ error: "Enter millimetres" })
  .int("Whole millimetres")
  .min(1, "Must be at least 1 mm")
  .max(100_000, "Must be at most 100 000 mm")
  .nullable()
  .optional();

/** A load-register entry: one schema for the form, the CSV import and the server. */
export const componentSchema = z.object({
  name: z.string().trim().min(2, "Name the component").max(200, "Use at most 200 characters"),
  massKg: z
    .number({ error: "Enter the mass in kg" })
    .refine(Number.isFinite, "Enter the mass in kg")
    .refine((m) => m > 0, "Must be more than 0 kg")
    .refine((m) => m <= 100_000, "Must be at most 100 000 kg"),
  lengthMm: dimension,
  widthMm: dimension,
  heightMm: dimension,
  grip: z.enum(["good", "fair", "poor"], { error: "Choose good, fair or poor" }),
  massSource: z.enum(["weighed", "datasheet", "estimated"], { error: "Choose weighed, datasheet or estimated" }),
  notes: z
    .string()
    .trim()
    .max(1000, "Use at most 1000 characters")
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional(),
});

export type ComponentInput = z.input<typeof componentSchema>;

/** Columns of the CSV import, in the order of the downloadable template. */
export const CSV_COLUMNS = [
  "name",
  "mass_kg",
  "length_mm",
  "width_mm",
  "height_mm",
  "grip",
  "mass_source",
  "notes",
] as const;

export const CSV_TEMPLATE = `${CSV_COLUMNS.join(",")}
Cable trough section 1 m,42,1000,250,200,poor,datasheet,Two-person lift
Trough lid 1 m,14,1000,250,50,poor,weighed,
`;

export const MAX_IMPORT_ROWS = 500;

export const MASS_SOURCE_LABELS = {
  weighed: "Weighed",
  datasheet: "Maker's data sheet",
  estimated: "Estimated",
} as const;
export const GRIP_LABELS = { good: "Good", fair: "Fair", poor: "Poor" } as const;
