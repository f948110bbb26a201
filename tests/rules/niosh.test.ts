/**
 * The NIOSH engine against published figures. Sources are named beside each check; see
 * shared REFERENCES.md §1 for the status of each figure ([pub], [calc], [memory]).
 */
import { describe, expect, it } from "vitest";
import {
  asymmetricMultiplier,
  couplingMultiplier,
  distanceMultiplier,
  horizontalMultiplier,
  METRIC,
  scoreNiosh,
  US_CUSTOMARY,
  verticalMultiplier,
  type NioshRequest,
} from "@/assessments/rules/niosh";
import { frequencyMultiplier } from "@/assessments/rules/niosh-frequency";
import { RULES_VERSION } from "@/assessments/rules/version";

/** The manual prints multipliers to 2 dp: an unrounded value must round to the printed one. */
const printed = (value: number, table: number) => expect(Math.abs(value - table)).toBeLessThanOrEqual(0.005 + 1e-9);

const ideal = (over: Partial<NioshRequest> = {}): NioshRequest => ({
  method: "niosh",
  units: "metric",
  load: 10,
  origin: { h: 25, v: 75, a: 0 },
  destination: { h: 25, v: 75, a: 0 },
  frequency: 0.2,
  durationHours: 1,
  recoveryHours: 1.2, // ≤ 1 h counts as short only with at least 1.2 × the work time of recovery after it
  coupling: "good",
  controlAtDestination: false,
  ...over,
});

describe("metric multipliers — NIOSH Applications Manual (Pub. 94-110), Tables 1–4, as reproduced [pub]", () => {
  it.each([
    [25, 1.0],
    [30, 0.83],
    [40, 0.63],
    [50, 0.5],
    [63, 0.4],
  ])("HM at H = %i cm is %f (Table 1)", (h, table) => printed(horizontalMultiplier(h, METRIC), table));

  it.each([
    [0, 0.78],
    [30, 0.87],
    [75, 1.0],
    [100, 0.93],
    [150, 0.78],
    [175, 0.7],
  ])("VM at V = %i cm is %f (Table 2)", (v, table) => printed(verticalMultiplier(v, METRIC), table));

  it.each([
    [25, 1.0],
    [40, 0.93],
    [100, 0.87],
    [175, 0.85],
  ])("DM at D = %i cm is %f (Table 3)", (d, table) => printed(distanceMultiplier(d, METRIC), table));

  it.each([
    [0, 1.0],
    [30, 0.9],
    [45, 0.86],
    [90, 0.71],
    [135, 0.57],
  ])("AM at A = %i° is %f (Table 4)", (a, table) => printed(asymmetricMultiplier(a), table));

  it("multipliers are 0 beyond the published ranges: H > 63, V > 175, D > 175, A > 135 [pub]", () => {
    expect(horizontalMultiplier(63.1, METRIC)).toBe(0);
    expect(verticalMultiplier(175.1, METRIC)).toBe(0);
    expect(distanceMultiplier(175.1, METRIC)).toBe(0);
    expect(asymmetricMultiplier(135.1)).toBe(0);
  });

  it("H below 25 cm and D below 25 cm count as 1.00 [pub]", () => {
    expect(horizontalMultiplier(10, METRIC)).toBe(1);
    expect(distanceMultiplier(5, METRIC)).toBe(1);
  });
});

describe("US customary multipliers — the published US equation [pub, REFERENCES.md §1]", () => {
  it("uses LC 51 lb, HM 10/H, VM 1 − 0.0075|V − 30|, DM 0.82 + 1.8/D", () => {
    expect(US_CUSTOMARY.loadConstant).toBe(51);
    expect(horizontalMultiplier(20, US_CUSTOMARY)).toBe(0.5);
    expect(horizontalMultiplier(25.1, US_CUSTOMARY)).toBe(0);
    expect(verticalMultiplier(44, US_CUSTOMARY)).toBeCloseTo(0.895, 10);
    expect(verticalMultiplier(70.1, US_CUSTOMARY)).toBe(0);
    expect(distanceMultiplier(37, US_CUSTOMARY)).toBeCloseTo(0.82 + 1.8 / 37, 12);
    expect(distanceMultiplier(70.1, US_CUSTOMARY)).toBe(0);
  });
});

describe("frequency multiplier — Manual Table 5 (rows ≤ 10/min [pub], 11–15/min [memory])", () => {
  // [F, ≤1h <75, ≤1h ≥75, 1–2h <75, 1–2h ≥75, 2–8h <75, 2–8h ≥75] as in REFERENCES.md §1.
  const rows: number[][] = [
    [0.2, 1.0, 1.0, 0.95, 0.95, 0.85, 0.85],
    [0.5, 0.97, 0.97, 0.92, 0.92, 0.81, 0.81],
    [1, 0.94, 0.94, 0.88, 0.88, 0.75, 0.75],
    [2, 0.91, 0.91, 0.84, 0.84, 0.65, 0.65],
    [3, 0.88, 0.88, 0.79, 0.79, 0.55, 0.55],
    [4, 0.84, 0.84, 0.72, 0.72, 0.45, 0.45],
    [5, 0.8, 0.8, 0.6, 0.6, 0.35, 0.35],
    [6, 0.75, 0.75, 0.5, 0.5, 0.27, 0.27],
    [7, 0.7, 0.7, 0.42, 0.42, 0.22, 0.22],
    [8, 0.6, 0.6, 0.35, 0.35, 0.18, 0.18],
    [9, 0.52, 0.52, 0.3, 0.3, 0.0, 0.15],
    [10, 0.45, 0.45, 0.26, 0.26, 0.0, 0.13],
    [11, 0.41, 0.41, 0.0, 0.23, 0.0, 0.0], // from memory
    [12, 0.37, 0.37, 0.0, 0.21, 0.0, 0.0], // from memory
    [13, 0.0, 0.34, 0.0, 0.0, 0.0, 0.0], // from memory
    [14, 0.0, 0.31, 0.0, 0.0, 0.0, 0.0], // from memory
    [15, 0.0, 0.28, 0.0, 0.0, 0.0, 0.0], // from memory
  ];
  const columns = [
    ["short", false],
    ["short", true],
    ["moderate", false],
    ["moderate", true],
    ["long", false],
    ["long", true],
  ] as const;

  it.each(rows)("row F = %f/min matches every column", (f, ...values) => {
    columns.forEach(([duration, high], i) => expect(frequencyMultiplier(f, duration, high)).toBeCloseTo(values[i], 10));
  });

  it("is 0 above 15 lifts/min [memory: the '>15' row]", () => {
    expect(frequencyMultiplier(15.5, "short", true)).toBe(0);
  });

  it("takes F below 0.2/min as 0.2 [pub]", () => {
    expect(frequencyMultiplier(0.05, "long", false)).toBe(0.85);
  });

  it("interpolates linearly between rows of the same column [memory: the manual's practice]", () => {
    expect(frequencyMultiplier(0.75, "short", true)).toBeCloseTo((0.97 + 0.94) / 2, 10);
    expect(frequencyMultiplier(2.5, "long", false)).toBeCloseTo((0.65 + 0.55) / 2, 10);
  });
});

describe("coupling multiplier — Manual Table 7 [memory]", () => {
  it("good 1.00/1.00, fair 0.95/1.00, poor 0.90/0.90 (V < 75 / V ≥ 75 cm)", () => {
    expect(couplingMultiplier("good", 50, METRIC)).toBe(1);
    expect(couplingMultiplier("fair", 50, METRIC)).toBe(0.95);
    expect(couplingMultiplier("fair", 80, METRIC)).toBe(1);
    expect(couplingMultiplier("poor", 50, METRIC)).toBe(0.9);
    expect(couplingMultiplier("poor", 80, METRIC)).toBe(0.9);
    expect(couplingMultiplier("fair", 29, US_CUSTOMARY)).toBe(0.95);
  });
});

describe("worked example: unloading a dish-washing machine — Waters 2006, ch. 46 §46.7.2 (also in the Applications Manual) [pub]", () => {
  const result = scoreNiosh({
    method: "niosh",
    units: "us",
    load: 20,
    origin: { h: 20, v: 44, a: 30 },
    destination: { h: 20, v: 7, a: 30 },
    frequency: 5,
    durationHours: 1,
    recoveryHours: 1.2, // ≤ 1 h counts as short only with at least 1.2 × the work time of recovery after it
    coupling: "good",
    controlAtDestination: true,
  });

  it("FM is 0.80 (5 lifts/min, ≤ 1 h)", () => {
    expect(result.origin.fm).toBeCloseTo(0.8, 10);
    expect(result.destination!.fm).toBeCloseTo(0.8, 10);
  });

  it("RWL is 14.4 lb at the origin and 13.3 lb at the destination (published, ±0.1 lb for the manual's 2-dp multipliers)", () => {
    expect(Math.abs(result.origin.rwl - 14.4)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(result.destination!.rwl - 13.3)).toBeLessThanOrEqual(0.1);
  });

  it("unrounded RWL 14.34 and 13.26 lb [calc, REFERENCES.md §1]", () => {
    expect(result.origin.rwl).toBeCloseTo(14.34, 2);
    expect(result.destination!.rwl).toBeCloseTo(13.26, 2);
  });

  it("with multipliers rounded to 2 dp as printed, the products are 14.38 and 13.26 lb [calc]", () => {
    const r2 = (x: number) => Math.round(x * 100) / 100;
    const product = (e: typeof result.origin) => 51 * r2(e.hm) * r2(e.vm) * r2(e.dm) * r2(e.am) * r2(e.fm) * r2(e.cm);
    expect(product(result.origin)).toBeCloseTo(14.38, 2);
    expect(product(result.destination!)).toBeCloseTo(13.26, 2);
  });

  it("LI is 1.4 at the origin and 1.5 at the destination; the destination governs [pub]", () => {
    expect(result.origin.li!.toFixed(1)).toBe("1.4");
    expect(result.destination!.li!.toFixed(1)).toBe("1.5");
    expect(result.li).toBe(result.destination!.li);
    expect(result.limit).toBe(result.destination!.rwl);
  });

  it("LI between 1 and 2 is banded watch (Heftwise policy) and the result carries reasons with sources", () => {
    expect(result.band).toBe("watch");
    expect(result.reasons.length).toBeGreaterThan(0);
    for (const reason of result.reasons) expect(reason.source).toMatch(/NIOSH|Heftwise/);
    expect(result.rulesVersion).toBe(RULES_VERSION);
  });
});

describe("bands and range — NIOSH interpretation (LI 1 and 3 [pub]; 2 is Heftwise policy)", () => {
  it("at the ideal position every multiplier is 1 and RWL equals LC = 23 kg [pub]", () => {
    const r = scoreNiosh(ideal({ load: 23 }));
    expect(r.origin.rwl).toBe(23);
    expect(r.li).toBe(1);
    expect(r.band).toBe("clear");
  });

  it.each([
    [23, "clear"],
    [23.5, "watch"],
    [46, "watch"],
    [46.5, "act"],
    [69, "act"],
    [69.5, "stop"],
  ])("load %f kg at RWL 23 kg is %s", (load, band) => {
    expect(scoreNiosh(ideal({ load })).band).toBe(band);
  });

  it("no destination result without significant control there", () => {
    expect(scoreNiosh(ideal()).destination).toBeNull();
  });

  it("H beyond 63 cm: HM 0, index null, band stop, a warning naming origin.h", () => {
    const r = scoreNiosh(ideal({ origin: { h: 70, v: 75, a: 0 } }));
    expect(r.origin.hm).toBe(0);
    expect(r.li).toBeNull();
    expect(r.index).toBeNull();
    expect(r.band).toBe("stop");
    expect(r.warnings.map((w) => w.field)).toContain("origin.h");
    expect(r.reasons[0].text).toMatch(/outside the range/);
  });

  it("warns for each out-of-range variable by name", () => {
    const r = scoreNiosh(
      ideal({
        origin: { h: 30, v: 0, a: 140 },
        destination: { h: 30, v: 180, a: 0 },
        frequency: 16,
        durationHours: 9,
        controlAtDestination: true,
      }),
    );
    const fields = r.warnings.map((w) => w.field);
    expect(fields).toEqual(expect.arrayContaining(["origin.a", "destination.v", "frequency", "durationHours"]));
    expect(r.band).toBe("stop");
  });

  it("frequency below 0.2/min is taken as 0.2, with a warning (never silent)", () => {
    const r = scoreNiosh(ideal({ frequency: 0.1 }));
    expect(r.derived.frequencyUsed).toBe(0.2);
    expect(r.warnings.map((w) => w.field)).toContain("frequency");
  });
});
