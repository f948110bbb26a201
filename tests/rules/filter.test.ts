/**
 * Guideline-weight filter, team handling and carrying against HSE L23 (4th ed. 2016; Appendix 3 of
 * the 3rd ed. 2004) and INDG143, as reproduced in REFERENCES.md §2.
 */
import { describe, expect, it } from "vitest";
import { guidelineWeight, scoreFilter, TABLE_ZONES, type FilterRequest } from "@/assessments/rules/filter";

const request = (over: Partial<FilterRequest> = {}): FilterRequest => ({
  method: "filter",
  sex: "male",
  zone: "knuckle-to-elbow",
  reach: "close",
  load: 10,
  frequency: 0.2,
  twistDeg: 0,
  teamSize: 1,
  ...over,
});

describe("guideline weights — HSE L23 filter table (men [pub, reproduction]; women [memory])", () => {
  const men = {
    "shoulder-to-reach": [10, 5],
    "elbow-to-shoulder": [20, 10],
    "knuckle-to-elbow": [25, 15],
    "lower-leg-to-knuckle": [20, 10],
    "floor-to-lower-leg": [10, 5],
  };
  const women = {
    "shoulder-to-reach": [7, 3],
    "elbow-to-shoulder": [13, 7],
    "knuckle-to-elbow": [16, 10],
    "lower-leg-to-knuckle": [13, 7],
    "floor-to-lower-leg": [7, 3],
  };
  it.each(TABLE_ZONES)("men, %s: close and extended [pub]", (zone) => {
    expect([guidelineWeight("male", zone, "close"), guidelineWeight("male", zone, "extended")]).toEqual(men[zone]);
  });
  it.each(TABLE_ZONES)("women, %s: close and extended [from memory]", (zone) => {
    expect([guidelineWeight("female", zone, "close"), guidelineWeight("female", zone, "extended")]).toEqual(
      women[zone],
    );
  });
  it("25 kg, men, knuckle to elbow, close: the one-person design figure of the trade (common practice, no published source) matches the table", () => {
    expect(scoreFilter(request({ load: 25 })).guideline).toBe(25);
    expect(scoreFilter(request({ load: 25 })).band).toBe("clear");
  });
});

describe("reductions — HSE L23 [pub] and Heftwise's documented policy for the gaps", () => {
  const g = (over: Partial<FilterRequest>) => scoreFilter(request(over)).guideline;
  it("none up to about 30 operations an hour (0.5/min) [pub]", () => expect(g({ frequency: 0.5 })).toBe(25));
  it("30 % at once or twice a minute [pub]", () => {
    expect(g({ frequency: 1 })).toBeCloseTo(17.5, 10);
    expect(g({ frequency: 2 })).toBeCloseTo(17.5, 10);
  });
  it("50 % at 5–8 a minute [pub]", () => expect(g({ frequency: 6 })).toBeCloseTo(12.5, 10));
  it("80 % above about 12 a minute [pub]", () => expect(g({ frequency: 13 })).toBeCloseTo(5, 10));
  it("3–4 a minute takes the 5–8 figure, 50 % (Heftwise policy, conservative)", () =>
    expect(g({ frequency: 3.5 })).toBeCloseTo(12.5, 10));
  it("9–12 a minute takes the above-12 figure, 80 % (Heftwise policy, conservative)", () =>
    expect(g({ frequency: 10 })).toBeCloseTo(5, 10));
  it("twisting beyond 45°: 10 %; beyond 90°: 20 % [pub]", () => {
    expect(g({ twistDeg: 45 })).toBe(25);
    expect(g({ twistDeg: 60 })).toBeCloseTo(22.5, 10);
    expect(g({ twistDeg: 100 })).toBeCloseTo(20, 10);
  });
  it("reductions add: 30 % + 10 % = 40 % (Heftwise policy, more conservative than multiplying)", () => {
    const r = scoreFilter(request({ frequency: 1, twistDeg: 60 }));
    expect(r.guideline).toBeCloseTo(15, 10);
    expect(r.reasons.some((x) => /added together/.test(x.text) && /Heftwise policy/.test(x.source))).toBe(true);
  });
  it("when nothing remains the index is null and the band stop", () => {
    const r = scoreFilter(request({ frequency: 13, twistDeg: 100 }));
    expect(r.guideline).toBe(0);
    expect(r.index).toBeNull();
    expect(r.band).toBe("stop");
  });
});

describe("team handling — HSE L23 [pub]", () => {
  it("a pair handles about two-thirds of the sum: one person 20 kg → a pair about 26.7 kg [calc, 2/3 × 40]", () => {
    const r = scoreFilter(request({ zone: "elbow-to-shoulder", teamSize: 2, load: 26 }));
    expect(r.guideline).toBeCloseTo(26.67, 2);
    expect(r.perPersonLoad).toBe(13);
    expect(r.band).toBe("clear");
  });
  it("a team of three handles about half the sum", () => {
    expect(scoreFilter(request({ teamSize: 3 })).guideline).toBeCloseTo(37.5, 10);
  });
  it("a team of more than four is flagged stop with the reason", () => {
    const r = scoreFilter(request({ teamSize: 5, load: 20 }));
    expect(r.band).toBe("stop");
    expect(r.reasons.some((x) => /more than four/.test(x.text))).toBe(true);
  });
});

describe("bands above the filter (Heftwise policy: ≤1 clear, ≤1.5 watch, ≤2 act, above stop)", () => {
  it.each([
    [25, "clear"],
    [30, "watch"],
    [45, "act"],
    [51, "stop"],
  ])("%i kg against 25 kg is %s", (load, band) => expect(scoreFilter(request({ load })).band).toBe(band));
});

describe("carrying — HSE L23 [pub]; cumulative mass ISO 11228-1 [memory]", () => {
  it("up to about 10 m held against the body the filter applies unchanged", () => {
    const r = scoreFilter(request({ carryDistanceM: 10, load: 20, frequency: 0.2 }));
    expect(r.warnings).toHaveLength(0);
    expect(r.band).toBe("clear");
  });
  it("beyond 10 m: a warning and at least watch", () => {
    const r = scoreFilter(request({ carryDistanceM: 25, load: 10 }));
    expect(r.warnings.map((w) => w.field)).toContain("carryDistanceM");
    expect(r.band).toBe("watch");
  });
  it("hands below knuckle height while carrying: a warning and at least watch", () => {
    const r = scoreFilter(request({ zone: "lower-leg-to-knuckle", carryDistanceM: 5, load: 5 }));
    expect(r.warnings.map((w) => w.field)).toContain("zone");
    expect(r.band).toBe("watch");
  });
  it("cumulative mass above 10 000 kg per 8 h shift raises the band to act [memory]", () => {
    // 25 kg × 1/min × 60 × 8 h = 12 000 kg; 30 % frequency reduction → index 25 / 17.5 = 1.43 (watch) on its own.
    const r = scoreFilter(request({ load: 25, frequency: 1, carryDistanceM: 8 }));
    expect(r.cumulativeMassKg).toBe(12_000);
    expect(r.band).toBe("act");
    expect(r.reasons.some((x) => /ISO 11228-1/.test(x.source) && /from memory/.test(x.source))).toBe(true);
  });
  it("carries of 20 m or more use the lower 6 000 kg allowance [memory]", () => {
    const r = scoreFilter(request({ load: 10, frequency: 1.5, carryDistanceM: 20, durationHours: 8 }));
    expect(r.cumulativeMassKg).toBe(7_200);
    expect(r.warnings.some((w) => /6000 kg/.test(w.message))).toBe(true);
  });
});
