import { describe, expect, it } from "vitest";
import { PATCH as patchOne } from "@/app/api/finishes/[finishId]/route";
import { GET as similar } from "@/app/api/finishes/[finishId]/similar/route";
import { GET as list } from "@/app/api/finishes/route";
import { deltaE2000 } from "@/lib/colour";
import type { Persona } from "@/tests/support/session";
import { call } from "@/tests/support/library";

type Hit = { id: string; name: string; category: string; deltaE: number; lab: [number, number, number]; archived: boolean };
const id = (key: string) => `demo-finish-${key}`;

const similarAs = (persona: Persona, finishId: string, query = "") =>
  call(persona, similar, `/api/finishes/${finishId}/similar${query}`, { params: { finishId } });

async function currentLibrary(): Promise<{ id: string; category: string; lab: [number, number, number] }[]> {
  const res = await call("designer", list, "/api/finishes?pageSize=200");
  return (res.body.items as { id: string; category: string; lab: [number, number, number] }[]).map((f) => ({ id: f.id, category: f.category, lab: f.lab }));
}

/** What a plain scan with the engine's CIEDE2000 finds (checked against Sharma, Wu & Dalal 2005 in tests/unit/colour). */
async function bruteForce(target: string, maxDeltaE: number, anyCategory = false) {
  const library = await currentLibrary();
  const self = library.find((f) => f.id === target);
  const lab = self?.lab ?? [0, 0, 0];
  return library
    .filter((f) => f.id !== target && (anyCategory || f.category === self?.category))
    .map((f) => ({ id: f.id, deltaE: deltaE2000(lab, f.lab) }))
    .filter((h) => h.deltaE <= maxDeltaE)
    .sort((a, b) => a.deltaE - b.deltaE || (a.id < b.id ? -1 : 1));
}

describe("GET /api/finishes/:id/similar", () => {
  it("lists every current finish of the same category within ΔE00 of this one, nearest first, without itself", async () => {
    const res = await similarAs("designer", id("cab-oat"), "?maxDeltaE=8");
    expect(res.status).toBe(200);
    const hits = res.body.items as Hit[];
    expect(res.body).toMatchObject({ maxDeltaE: 8, anyCategory: false });
    const expected = await bruteForce(id("cab-oat"), 8);
    expect(expected.length).toBeGreaterThan(1);
    expect(hits.map((h) => h.id)).toEqual(expected.map((h) => h.id));
    expect(new Set(hits.map((h) => h.category))).toEqual(new Set(["cabinetry"]));
    hits.forEach((h, i) => expect(h.deltaE).toBeCloseTo(expected[i]?.deltaE ?? NaN, 2));
  });

  it("with anyCategory=1 lists every category, nearest first", async () => {
    const res = await similarAs("designer", id("cab-oat"), "?maxDeltaE=8&anyCategory=1");
    expect(res.status).toBe(200);
    expect(res.body.anyCategory).toBe(true);
    const hits = res.body.items as Hit[];
    const expected = await bruteForce(id("cab-oat"), 8, true);
    expect(hits.map((h) => h.id)).toEqual(expected.map((h) => h.id));
    expect(new Set(hits.map((h) => h.category)).size).toBeGreaterThan(1);
  });

  it("never offers a benchtop a sink, a hinge or a pendant unless asked [project rule: a substitute does the same job]", async () => {
    const same = (await similarAs("designer", id("saltbush"), "?maxDeltaE=20")).body.items as Hit[];
    expect(same.length).toBeGreaterThan(0);
    expect(same.every((h) => h.category === "stone")).toBe(true);
    const any = (await similarAs("designer", id("saltbush"), "?maxDeltaE=20&anyCategory=1")).body.items as Hit[];
    expect(any.some((h) => h.category !== "stone")).toBe(true);
  });

  it("answers 400 for an anyCategory that is not 0 or 1", async () => {
    const res = await similarAs("designer", id("cab-oat"), "?anyCategory=yes");
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fieldErrors as object)).toEqual(["anyCategory"]);
  });

  it("defaults to ΔE00 3", async () => {
    const res = await similarAs("owner", id("cab-oat"));
    expect(res.body.maxDeltaE).toBe(3);
    expect((res.body.items as Hit[]).map((h) => h.id)).toEqual((await bruteForce(id("cab-oat"), 3)).map((h) => h.id));
  });

  it("follows the library as it changes: a recoloured finish joins, an archived one leaves", async () => {
    const target = id("cab-chalk");
    const near = (await similarAs("designer", target, "?maxDeltaE=2&anyCategory=1")).body.items as Hit[];
    expect(near.some((h) => h.id === id("basalt-night"))).toBe(false);
    const chalk = (await currentLibrary()).find((f) => f.id === target)?.lab ?? [0, 0, 0];
    await call("designer", patchOne, `/api/finishes/${id("basalt-night")}`, {
      method: "PATCH",
      json: { colour: { source: "published", value: `lab(${chalk[0]} ${chalk[1] + 0.5} ${chalk[2]})` } },
      params: { finishId: id("basalt-night") },
    });
    const after = (await similarAs("designer", target, "?maxDeltaE=2&anyCategory=1")).body.items as Hit[];
    expect(after.some((h) => h.id === id("basalt-night"))).toBe(true);
    await call("designer", patchOne, `/api/finishes/${id("basalt-night")}`, { method: "PATCH", json: { archived: true }, params: { finishId: id("basalt-night") } });
    const archived = (await similarAs("designer", target, "?maxDeltaE=2&anyCategory=1")).body.items as Hit[];
    expect(archived.some((h) => h.id === id("basalt-night"))).toBe(false);
  });

  it("answers 400 for a ΔE00 out of range", async () => {
    for (const q of ["?maxDeltaE=-1", "?maxDeltaE=50", "?maxDeltaE=lots"]) {
      const res = await similarAs("designer", id("cab-oat"), q);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.fieldErrors as object)).toEqual(["maxDeltaE"]);
    }
  });

  it.each<[Persona, number]>([
    ["other", 404],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("refuses %s with %i", async (persona, status) => {
    expect((await similarAs(persona, id("cab-oat"))).status).toBe(status);
  });

  it("keeps another studio's finishes out of our results, and ours out of theirs", async () => {
    const res = await similarAs("other", "demo-finish-northwall-limestone", "?maxDeltaE=20");
    expect(res.status).toBe(200);
    expect(res.body.items).toEqual([]);
    const ours = (await similarAs("designer", id("saltbush"), "?maxDeltaE=20&anyCategory=1")).body.items as Hit[];
    expect(ours.some((h) => h.id === "demo-finish-northwall-limestone")).toBe(false);
  });
});
