/**
 * Railway mileages in miles and chains. The units are fixed by definition: 1760 yards to the mile and
 * 22 yards to the chain, so 80 chains to the mile (Weights and Measures Act 1985, Schedule 1: recalled
 * from memory). The way mileages are written, "14m 22ch", is common practice on the British railway,
 * no published source.
 */
import { describe, expect, it } from "vitest";
import { inYards, normaliseMileage } from "@/lib/mileage";
import { jobSchema } from "@/assessments/jobs/schemas";

describe("railway mileages", () => {
  it("reads the usual ways of writing one and shows them one way", () => {
    for (const written of ["14m 22ch", "14m22ch", "14 m 22 ch", "14 miles 22 chains", "14M 22CH", "14mi 22c"])
      expect(normaliseMileage(written), written).toBe("14m 22ch");
    expect(normaliseMileage("3m 5ch")).toBe("3m 05ch");
    expect(normaliseMileage("14m 22ch 10yd")).toBe("14m 22ch 10yd");
  });

  it("reads a stretch between two mileages", () => {
    expect(normaliseMileage("17m 05ch – 17m 15ch")).toBe("17m 05ch – 17m 15ch");
    expect(normaliseMileage("17m5ch-17m15ch")).toBe("17m 05ch – 17m 15ch");
    expect(normaliseMileage("17m 05ch to 17m 15ch")).toBe("17m 05ch – 17m 15ch");
    expect(normaliseMileage("17m 05ch – 17m 05ch")).toBe("17m 05ch");
  });

  it("refuses what is not miles and chains, rather than guess", () => {
    // Decimal miles are ambiguous: 14.22 miles is 14m 17.6ch, not 14m 22ch.
    for (const bad of [
      "14.22",
      "14.5",
      "14",
      "14m",
      "14m 80ch",
      "14m 22ch 22yd",
      "22ch",
      "14km 22ch",
      "1m 2ch – 3m 4ch – 5m 6ch",
      "",
    ])
      expect(normaliseMileage(bad), bad).toBeNull();
  });

  it("orders mileages by the units' definitions: 80 chains to the mile, 22 yards to the chain", () => {
    expect(inYards({ miles: 1, chains: 0, yards: 0 })).toBe(1760);
    expect(inYards({ miles: 0, chains: 1, yards: 0 })).toBe(22);
    expect(inYards({ miles: 14, chains: 22, yards: 10 })).toBe(14 * 1760 + 22 * 22 + 10);
  });

  it("the job form stores the one form and names the field when it cannot read it", () => {
    const base = { name: "Hollin Vale loop", client: "Client", location: "Hollin Vale" };
    expect(jobSchema.parse({ ...base, mileage: "14 miles 22 chains" }).mileage).toBe("14m 22ch");
    expect(jobSchema.parse({ ...base, mileage: "" }).mileage).toBeNull();
    const bad = jobSchema.safeParse({ ...base, mileage: "14.22" });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0]).toMatchObject({
      path: ["mileage"],
      message: expect.stringMatching(/miles and chains/),
    });
  });
});
