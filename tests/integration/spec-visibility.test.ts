import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as listRevisions, POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { GET as exportCsv } from "@/app/api/revisions/[revisionId]/export.csv/route";
import { POST as acknowledge } from "@/app/api/revisions/[revisionId]/acknowledge/route";
import { PATCH as patchLine } from "@/app/api/revisions/[revisionId]/lines/[lineId]/route";
import { GET as listFixed, POST as addFixed } from "@/app/api/projects/[projectId]/fixed-items/route";
import { actAsAny, appliances, call, project, revisionA, stone, type SpecPersona } from "./spec-helpers";

// Who may do what (README, API; PRODUCT.md, "Who uses it"): staff of the project's studio see
// everything; the project's clients are refused (403); suppliers see only their own lines of
// revisions with lines for them; other studios get 404 as if nothing were there; signed out 401.
const csv = (revisionId: string, supplier?: string) =>
  call(exportCsv, { revisionId }, { path: `/api/revisions/${revisionId}/export.csv${supplier ? `?supplier=${supplier}` : ""}` });

const as = async <T>(persona: SpecPersona, work: () => Promise<T>) => {
  actAsAny(persona);
  return work();
};

describe("who sees a revision", () => {
  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["owner", 200],
    ["designer", 200],
    ["other", 404],
    ["client", 403],
    ["client2", 403],
    ["otherclient", 404], // a client of another studio's project
    ["stone", 200],
    ["appliances", 200],
    ["joinery", 404], // nothing of theirs in revision A
  ])("GET /api/revisions/:id as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(getRevision, { revisionId: revisionA }))).status).toBe(status);
  });

  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["designer", 200],
    ["other", 404],
    ["client", 403],
    ["stone", 200],
  ])("GET /api/projects/:id/revisions as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(listRevisions, { projectId: project }))).status).toBe(status);
  });

  it("answers 404 for a revision that does not exist, as for one you may not see", async () => {
    expect((await as("designer", () => call(getRevision, { revisionId: "no-such-revision" }))).status).toBe(404);
  });

  it("gives a supplier their own lines only: no other supplier, no content, no prices", async () => {
    const res = await as("stone", () => call(getRevision, { revisionId: revisionA }));
    const lines = res.body.lines as { supplierId: string; item: string }[];
    expect(lines.map((l) => l.item).sort()).toEqual(["Benchtop", "Laundry benchtop"]);
    expect(lines.every((l) => l.supplierId === stone)).toBe(true);
    expect(res.body.content).toBeNull();
    expect(res.body.suppliers).toEqual([]);
    for (const word of ["Hearthline", "Lanternfield", "Groundswell", appliances, "price", "Cents", "allowance"]) expect(res.text).not.toContain(word);
    const staff = await as("designer", () => call(getRevision, { revisionId: revisionA }));
    expect((staff.body.lines as unknown[]).length).toBe(7);
  });

  it("lists for a supplier only the revisions that have lines for them", async () => {
    const stoneList = await as("stone", () => call(listRevisions, { projectId: project }));
    expect((stoneList.body.items as { letter: string; lineCount: number }[]).map((r) => [r.letter, r.lineCount])).toEqual([["A", 2]]);
    const joinery = await as("joinery", () => call(listRevisions, { projectId: project }));
    expect(joinery.body.items).toEqual([]);
  });
});

describe("who may export which CSV", () => {
  it.each<[SpecPersona, string | undefined, number]>([
    ["anonymous", undefined, 401],
    ["designer", undefined, 200],
    ["designer", stone, 200],
    ["designer", "demo-supplier-joinery", 404],
    ["other", undefined, 404],
    ["client", undefined, 403],
    ["otherclient", stone, 404],
    ["stone", undefined, 200],
    ["stone", stone, 200],
    ["stone", appliances, 403],
    ["appliances", stone, 403],
  ])("as %s, supplier %s → %i", async (persona, supplier, status) => {
    expect((await as(persona, () => csv(revisionA, supplier))).status).toBe(status);
  });

  it("gives a supplier's contact only their company's rows, as an attachment with a safe name", async () => {
    const res = await as("stone", () => csv(revisionA));
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="marrow-street-terrace-revision-a-ridgeline-stoneworks.csv"');
    const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r["Supplier"])).toEqual(["Ridgeline Stoneworks", "Ridgeline Stoneworks"]);
    const all = await as("designer", () => csv(revisionA));
    expect((parse(all.text, { bom: true, columns: true }) as unknown[]).length).toBe(7);
  });
});

describe("who may act", () => {
  let lineOfAppliances = "";
  beforeAll(async () => {
    const res = await as("designer", () => call(getRevision, { revisionId: revisionA }));
    lineOfAppliances = (res.body.lines as { id: string; supplierId: string }[]).find((l) => l.supplierId === appliances)?.id ?? "";
  });

  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["client", 403],
    ["stone", 403],
    ["other", 404],
  ])("POST /api/projects/:id/revisions (issue) as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(issue, { projectId: project }, { method: "POST" }))).status).toBe(status);
  });

  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["designer", 403],
    ["owner", 403],
    ["client", 403],
    ["other", 403],
    ["joinery", 404],
  ])("POST /api/revisions/:id/acknowledge as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(acknowledge, { revisionId: revisionA }, { method: "POST" }))).status).toBe(status);
  });

  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["designer", 403],
    ["client", 403],
    ["stone", 404], // another supplier's line is not theirs to see
  ])("PATCH another supplier's line as %s → %i", async (persona, status) => {
    const res = await as(persona, () =>
      call(patchLine, { revisionId: revisionA, lineId: lineOfAppliances }, { method: "PATCH", body: { orderedOn: "2026-11-30" } }),
    );
    expect(res.status).toBe(status);
  });

  it.each<[SpecPersona, number]>([
    ["anonymous", 401],
    ["client", 403],
    ["stone", 403],
    ["other", 404],
    ["designer", 200],
  ])("GET /api/projects/:id/fixed-items as %s → %i", async (persona, status) => {
    expect((await as(persona, () => call(listFixed, { projectId: project }))).status).toBe(status);
  });

  it("checks a fixed item's fields and references with plain field errors", async () => {
    const res = await as("designer", () =>
      call(addFixed, { projectId: project }, {
        method: "POST",
        body: { roomId: "demo-room-quarry-kitchen", finishId: "demo-finish-northwall-limestone", item: "Oven", quantity: 1, unit: "each" },
      }),
    );
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fieldErrors as object).sort()).toEqual(["finishId", "roomId"]);
    const bad = await as("designer", () => call(addFixed, { projectId: project }, { method: "POST", body: { item: "", quantity: "lots" } }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fieldErrors as object)).toEqual(expect.arrayContaining(["roomId", "finishId", "item", "quantity", "unit"]));
  });
});
