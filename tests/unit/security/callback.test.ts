import { describe, expect, it } from "vitest";
import { safeCallback } from "@/lib/auth/callback";

// Browsers parse a Location header with the WHATWG URL Standard (§4.4, "basic URL parser"): ASCII
// tab and newline are removed, "\" counts as "/" in special schemes, and "//host" is another host.
// The attacks below are the ones an outside review sent through the sign-in return address.
describe("return addresses after sign-in", () => {
  it.each([
    "/\t/evil.example/x",
    "/\n/evil.example",
    "//evil.example",
    "/\\evil.example",
    "/\\\\evil.example",
    "/.//evil.example",
    "/%2e//evil.example",
    "https://evil.example/x",
    "javascript:alert(1)",
    " /studio",
    "",
  ])("refuses %j", (value) => {
    const path = safeCallback(value);
    expect(path).toBe("/home");
  });

  it("keeps a path on this site, with its query and fragment", () => {
    expect(safeCallback("/client/decisions/abc?tab=options#top")).toBe("/client/decisions/abc?tab=options#top");
    expect(safeCallback("/studio/projects/p1/../p2")).toBe("/studio/projects/p2");
  });

  it("never returns anything a browser would take to another host", () => {
    for (const value of ["/\t/evil.example", "/./\t/evil.example", "/a/../\t/evil.example", "/%09/evil.example"]) {
      const path = safeCallback(value);
      expect(new URL(path, "https://mottle.test").host).toBe("mottle.test");
    }
  });
});
