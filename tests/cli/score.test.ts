/** The scoring CLI as another tool would call it: `npm run --silent score -- FILE`. */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";

const dir = mkdtempSync(path.join(tmpdir(), "heftwise-score-"));

function run(input: string, viaStdin = false) {
  const file = path.join(dir, `${Math.random().toString(36).slice(2)}.json`);
  if (!viaStdin) writeFileSync(file, input);
  const result = spawnSync("npm", ["run", "--silent", "score", "--", viaStdin ? "-" : file], {
    input: viaStdin ? input : undefined,
    encoding: "utf8",
  });
  return { status: result.status, json: result.stdout ? JSON.parse(result.stdout) : undefined, stderr: result.stderr };
}

const lift = {
  method: "niosh",
  units: "metric",
  load: 12,
  origin: { h: 25, v: 55, a: 0 },
  destination: { h: 25, v: 150, a: 0 },
  frequency: 3,
  durationHours: 0.75,
  coupling: "good",
  controlAtDestination: false,
};
const filter = {
  method: "filter",
  sex: "male",
  zone: "knuckle-to-elbow",
  reach: "close",
  load: 20,
  frequency: 0.2,
  twistDeg: 0,
  teamSize: 1,
};

describe("npm run score", () => {
  it("scores one request from a file and exits 0", () => {
    const { status, json } = run(JSON.stringify(lift));
    expect(status).toBe(0);
    expect(json.method).toBe("niosh");
    expect(json.destination).toBeNull();
    expect(["clear", "watch", "act", "stop"]).toContain(json.band);
    expect(json.origin).toEqual(
      expect.objectContaining({
        hm: 1,
        vm: expect.any(Number),
        fm: expect.any(Number),
        rwl: expect.any(Number),
        li: expect.any(Number),
      }),
    );
  });

  it("scores an array from standard input, in order, with errors in place and exit 2", () => {
    const { status, json } = run(JSON.stringify([lift, { ...filter, load: -1 }, filter]), true);
    expect(status).toBe(2);
    expect(json).toHaveLength(3);
    expect(json[0].method).toBe("niosh");
    expect(json[1].error.issues).toEqual([{ path: "load", message: "must be greater than 0" }]);
    expect(json[2].method).toBe("filter");
  });

  it("names every bad field of an invalid request", () => {
    const { status, json } = run(JSON.stringify({ ...lift, units: "furlongs", origin: { h: "near", v: 50, a: 0 } }));
    expect(status).toBe(2);
    expect(json.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["origin.h", "units"]);
  });

  it("answers malformed JSON with an error object and exit 2", () => {
    const { status, json } = run("{ not json");
    expect(status).toBe(2);
    expect(json.error.message).toMatch(/Not valid JSON/);
  });
});
