import { describe, expect, it, vi } from "vitest";
import { GET, PATCH } from "@/app/api/studio/settings/route";
import { saveStudioSettingsAction } from "@/app/studio/settings/actions";
import { idle } from "@/lib/actions/result";
import { call } from "@/tests/support/decision-calls";
import { countRows } from "@/tests/support/library";
import { actAs, type Persona } from "@/tests/support/session";

// Outside a request Next has no cache to refresh.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const demoStudio = "demo-studio-fernleaf";
const otherStudio = "demo-studio-northwall";
const rates = async (studio = demoStudio) => ({
  markup: await countRows("studio", `id = '${studio}' and markup_basis_points = 0`),
  tax: await countRows("studio", `id = '${studio}' and tax_basis_points = 1000`),
});
const settingsAudits = () => countRows("audit_log", "action = 'studio.settings.changed'");
const patch = (body: unknown) => call(PATCH, {}, { method: "PATCH", body });
const form = (fields: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
};

describe("GET /api/studio/settings", () => {
  it("gives each studio's staff their own studio's rates: no markup and GST 10 % by default", async () => {
    // GST 10 %: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 (Australian Taxation Office).
    for (const [persona, studioId, canChange] of [["owner", demoStudio, true], ["designer", demoStudio, false], ["other", otherStudio, true]] as const) {
      actAs(persona);
      const reply = await call(GET, {});
      expect(reply.status).toBe(200);
      expect(reply.body).toMatchObject({ studioId, markupBasisPoints: 0, taxBasisPoints: 1000, canChange });
    }
  });
  it.each<[Persona, number]>([["client", 403], ["otherclient", 403], ["stone", 403], ["joinery", 403], ["anonymous", 401]])("refuses %s with %i", async (persona, status) => {
    actAs(persona);
    const reply = await call(GET, {});
    expect(reply.status).toBe(status);
    expect(JSON.stringify(reply.body)).not.toMatch(/BasisPoints/);
  });
});

describe("PATCH /api/studio/settings: the owner changes them, nobody else", () => {
  it.each<[Persona, number]>([["designer", 403], ["client", 403], ["client2", 403], ["stone", 403], ["joinery", 403], ["anonymous", 401]])("refuses %s with %i, writing nothing", async (persona, status) => {
    actAs(persona);
    const before = await settingsAudits();
    const reply = await patch({ markupBasisPoints: 2000, taxBasisPoints: 1000 });
    expect(reply.status).toBe(status);
    expect(await rates()).toEqual({ markup: 1, tax: 1 });
    expect(await settingsAudits()).toBe(before);
  });

  it.each<[string, unknown, string[]]>([
    ["an empty body", {}, ["markupBasisPoints", "taxBasisPoints"]],
    ["a negative markup", { markupBasisPoints: -1, taxBasisPoints: 1000 }, ["markupBasisPoints"]],
    ["a tax past 50 %", { markupBasisPoints: 0, taxBasisPoints: 5001 }, ["taxBasisPoints"]],
    ["a percentage instead of basis points", { markupBasisPoints: 12.5, taxBasisPoints: "10" }, ["markupBasisPoints", "taxBasisPoints"]],
  ])("answers %s with 400 and field errors, writing nothing", async (_what, body, fields) => {
    actAs("owner");
    const before = await settingsAudits();
    const reply = await patch(body);
    expect(reply.status).toBe(400);
    expect(Object.keys(reply.body.fieldErrors as object).sort()).toEqual(fields);
    expect(await rates()).toEqual({ markup: 1, tax: 1 });
    expect(await settingsAudits()).toBe(before);
  });

  it("the other studio's owner changes only their own studio", async () => {
    actAs("other");
    const reply = await patch({ markupBasisPoints: 1500, taxBasisPoints: 1000 });
    expect(reply.status).toBe(200);
    expect(await countRows("studio", `id = '${otherStudio}' and markup_basis_points = 1500`)).toBe(1);
    expect(await rates()).toEqual({ markup: 1, tax: 1 });
    await patch({ markupBasisPoints: 0, taxBasisPoints: 1000 });
  });

  it("the owner's change is saved and audited with before and after", async () => {
    actAs("owner");
    const before = await settingsAudits();
    const reply = await patch({ markupBasisPoints: 1800, taxBasisPoints: 1500 });
    expect(reply.status).toBe(200);
    expect(reply.body).toMatchObject({ markupBasisPoints: 1800, taxBasisPoints: 1500, repriced: expect.any(Object) });
    expect(await countRows("studio", `id = '${demoStudio}' and markup_basis_points = 1800 and tax_basis_points = 1500`)).toBe(1);
    expect(await settingsAudits()).toBe(before + 1);
    expect(await countRows("audit_log", `action = 'studio.settings.changed' and json_extract(detail, '$.before.markupBasisPoints') = 0 and json_extract(detail, '$.after.markupBasisPoints') = 1800`)).toBe(1);
    await patch({ markupBasisPoints: 0, taxBasisPoints: 1000 });
  });
});

describe("the settings form's server action (works without JavaScript)", () => {
  it("takes percentages as typed and saves them as basis points", async () => {
    actAs("owner");
    const result = await saveStudioSettingsAction(idle, form({ markup: "12.5 %", tax: " 10 " }));
    expect(result.ok).toBe(true);
    expect(await countRows("studio", `id = '${demoStudio}' and markup_basis_points = 1250 and tax_basis_points = 1000`)).toBe(1);
    await saveStudioSettingsAction(idle, form({ markup: "0", tax: "10" }));
  });
  it("refuses a comma for the decimal, keeps what was typed and names the field, writing nothing", async () => {
    actAs("owner");
    const before = await settingsAudits();
    const result = await saveStudioSettingsAction(idle, form({ markup: "12,5", tax: "10" }));
    expect(result).toMatchObject({ ok: false, status: 400, values: { markup: "12,5", tax: "10" }, fieldErrors: { markup: ["Use a full stop for part of a percent, like 12.5."] } });
    expect(await rates()).toEqual({ markup: 1, tax: 1 });
    expect(await settingsAudits()).toBe(before);
  });
  it("refuses a designer (403) before reading the form", async () => {
    actAs("designer");
    const result = await saveStudioSettingsAction(idle, form({ markup: "20", tax: "10" }));
    expect(result).toMatchObject({ ok: false, status: 403 });
    expect(await rates()).toEqual({ markup: 1, tax: 1 });
  });
});
