import { describe, expect, it } from "vitest";
import { canonicalJson, sha256Hex } from "@/lib/spec/canonical";
import { hashRevision, serialiseRevision, verifyRevision } from "@/lib/spec/revision-content";
import { comparedFields, type SpecLineContent } from "@/lib/spec/types";
import { sampleLines } from "./fixtures";

const revision = (lines: SpecLineContent[]) => serialiseRevision({ letter: "B", projectId: "p-1", lines });

describe("the hash of a revision", () => {
  it("is SHA-256 (FIPS 180-4 example: \"abc\")", () => {
    // Published test vector, NIST FIPS 180-4 examples (SHA256.pdf): SHA-256("abc").
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("is the same whatever order the keys and lines arrive in", () => {
    const lines = sampleLines();
    const shuffled = [...lines].reverse().map((l) => Object.fromEntries(Object.entries(l).reverse()) as SpecLineContent);
    expect(revision(shuffled)).toBe(revision(lines));
    expect(hashRevision(revision(shuffled))).toBe(hashRevision(revision(lines)));
  });

  it("leaves out everything but the frozen fields", () => {
    const lines = sampleLines().map((l) => ({ ...l, id: "row-id", order: { orderedOn: "2026-12-01" } }));
    expect(revision(lines)).toBe(revision(sampleLines()));
    expect(revision(lines)).not.toContain("row-id");
  });

  it("is canonical JSON: sorted keys, no whitespace", () => {
    const text = revision(sampleLines());
    expect(text).toBe(canonicalJson(JSON.parse(text)));
    expect(text.startsWith('{"letter":"B","lines":[{"cautions":["natural-stone-silica"],"finishId"')).toBe(true);
  });

  it.each(comparedFields)("changes when %s of any line changes", (field) => {
    const before = hashRevision(revision(sampleLines()));
    for (const index of [0, 1]) {
      const lines = sampleLines();
      const line = lines[index] as SpecLineContent;
      const value = line[field];
      const changed = typeof value === "number" ? value + 1 : Array.isArray(value) ? [...value, "child-safety"] : `${value ?? ""}x`;
      lines[index] = { ...line, [field]: changed };
      expect(hashRevision(revision(lines))).not.toBe(before);
    }
  });

  it("changes with the letter, the project, or a line added or removed", () => {
    const base = hashRevision(revision(sampleLines()));
    expect(hashRevision(serialiseRevision({ letter: "C", projectId: "p-1", lines: sampleLines() }))).not.toBe(base);
    expect(hashRevision(serialiseRevision({ letter: "B", projectId: "p-2", lines: sampleLines() }))).not.toBe(base);
    expect(hashRevision(revision(sampleLines().slice(1)))).not.toBe(base);
  });

  it("verifies stored content against its hash and its rows", () => {
    const lines = sampleLines();
    const content = revision(lines);
    const stored = { letter: "B", projectId: "p-1", content, sha256: hashRevision(content) };
    expect(verifyRevision({ ...stored, lines })).toBe(true);
    expect(verifyRevision({ ...stored, sha256: "0".repeat(64), lines })).toBe(false);
    const tampered = sampleLines();
    tampered[0] = { ...(tampered[0] as SpecLineContent), quantity: 7 };
    expect(verifyRevision({ ...stored, lines: tampered })).toBe(false);
  });
});
