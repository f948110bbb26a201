/** Pushing and pulling against HSE L23 guideline forces and its worked figures (REFERENCES.md §2, §5). */
import { describe, expect, it } from "vitest";
import { GRAVITY, scorePush, type PushRequest } from "@/assessments/rules/push";

const request = (over: Partial<PushRequest> = {}): PushRequest => ({
  method: "push",
  mass: 400,
  gradient: 0,
  sex: "male",
  teamSize: 1,
  ...over,
});

describe("force from mass and gradient", () => {
  it("a well-maintained aid on level ground needs 2 % of the load: 400 kg → 8 kg [pub, HSE L23]", () => {
    expect(scorePush(request()).sustainedForceN / GRAVITY).toBeCloseTo(8, 10);
  });
  it("400 kg up 1 in 12 needs over 30 kg [pub]; 41.2 kgf with 2 % rolling [calc, REFERENCES.md §2]", () => {
    const kgf = scorePush(request({ gradient: 1 / 12 })).sustainedForceN / GRAVITY;
    expect(kgf).toBeGreaterThan(30);
    expect(kgf).toBeCloseTo(41.2, 1);
  });
  it("the slope alone is 33.2 kgf (400 × sin(atan(1/12))) [calc]", () => {
    expect(scorePush(request({ gradient: 1 / 12, rollingCoefficient: 0 })).sustainedForceN / GRAVITY).toBeCloseTo(
      33.2,
      1,
    );
  });
  it("starting takes more than keeping moving (Heftwise policy: twice the rolling resistance)", () => {
    const r = scorePush(request());
    expect(r.startForceN).toBeCloseTo(2 * r.sustainedForceN, 10);
  });
  it("a measured force overrides both estimates", () => {
    const r = scorePush(request({ measuredForceN: 150 }));
    expect(r.sustainedForceN).toBe(150);
    expect(r.startForceN).toBe(150);
    expect(r.forceSource).toBe("measured");
  });
});

describe("guideline forces — HSE L23 [pub]: men 200 N start / 100 N moving, women 150 / 70", () => {
  it("men", () => {
    const r = scorePush(request());
    expect([r.guidelineStartN, r.guidelineSustainedN]).toEqual([200, 100]);
  });
  it("women", () => {
    const r = scorePush(request({ sex: "female" }));
    expect([r.guidelineStartN, r.guidelineSustainedN]).toEqual([150, 70]);
  });
  it("400 kg on the level is within the men's guideline (clear); up 1 in 12 it is stop", () => {
    expect(scorePush(request()).band).toBe("clear");
    expect(scorePush(request({ gradient: 1 / 12 })).band).toBe("stop");
  });
  it("a team pushing shares the force, with the team factor applied (Heftwise policy)", () => {
    const r = scorePush(request({ teamSize: 2, gradient: 1 / 12 }));
    expect(r.guidelineSustainedN).toBeCloseTo(100 * 2 * (2 / 3), 10);
    expect(r.perPersonSustainedN).toBeCloseTo(r.sustainedForceN / 2, 10);
  });
  it("more than about 20 m without a break: a warning and at least watch [pub]", () => {
    const r = scorePush(request({ mass: 100, distanceM: 60 }));
    expect(r.warnings.map((w) => w.field)).toContain("distanceM");
    expect(r.band).toBe("watch");
  });
  it("downhill on hard ground warns of a runaway; on rails, unbraked, it asks for a brake", () => {
    expect(scorePush(request({ gradient: -0.05, surface: "hard" })).warnings.map((w) => w.field)).toContain("gradient");
    expect(scorePush(request({ gradient: -0.05, surface: "rail" })).warnings.map((w) => w.field)).toContain("braked");
  });
});
