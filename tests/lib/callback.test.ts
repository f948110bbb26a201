/** After sign-in, only a path on this site: never an open redirect. */
import { describe, expect, it } from "vitest";
import { safeCallbackPath } from "@/lib/auth/callback";

describe("the callback after sign-in", () => {
  it.each(["/assessments", "/revisions/abc?step=loads", "/reviews/x#sign"])("keeps the path %s", (path) =>
    expect(safeCallbackPath(path)).toBe(path),
  );
  it.each([
    "/\\evil.example/x",
    "//evil.example/x",
    "/\\/evil.example",
    "https://evil.example/",
    "javascript:alert(1)",
    "/\t/evil.example",
    "",
    undefined,
    "assessments",
  ])("sends %j to the overview", (value) => expect(safeCallbackPath(value)).toBe("/"));
});
