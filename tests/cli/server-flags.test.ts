/** `npm start` and the servers the demo and the benches start run with the same Node.js flags. */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { SERVER_NODE_FLAGS } from "@/assessments/cli/build";

describe("the production server's Node.js flags", () => {
  it("are spelt out in package.json's start script", () => {
    const { scripts } = JSON.parse(readFileSync("package.json", "utf8")) as { scripts: Record<string, string> };
    const start = scripts.start.split(/\s+/);
    expect(SERVER_NODE_FLAGS.length).toBeGreaterThan(0);
    for (const flag of SERVER_NODE_FLAGS) expect(start).toContain(flag);
  });
});
