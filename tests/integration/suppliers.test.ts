import { describe, expect, it } from "vitest";
import { listActiveSuppliers } from "@/db/queries/suppliers";
import { trades } from "@/db/schema";
import { tradeLabels } from "@/lib/suppliers/trades";
import { countRows, runSql } from "@/tests/support/library";
import type { Persona } from "@/tests/support/session";
import { items, listAs, made, newSupplier, one, post, rowCounts, STONE, STUDIO, THEIRS, type SupplierAnswer as Supplier } from "@/tests/support/supplier-calls";

// Status codes as RFC 9110 defines them: 201 Created (§15.3.2), 204 No Content (§15.3.5),
// 400 (§15.5.1), 401 (§15.5.2), 403 (§15.5.4), 404 (§15.5.5), 409 Conflict (§15.5.10).
// Who may do what, and "another studio's id is 404", are the product's own rules (the brief).
const outsiders: [Persona, number][] = [["client", 403], ["stone", 403], ["anonymous", 401]];

describe("trade labels", () => {
  it("names every trade the schema allows (project rule: the brief's list)", () => {
    expect(Object.keys(tradeLabels).sort()).toEqual([...trades].sort());
    expect([tradeLabels.stone, tradeLabels.joinery, tradeLabels.tiles, tradeLabels.paint]).toEqual(["Stonemason", "Cabinetmaker", "Tiler", "Painter"]);
  });
});

describe("GET /api/suppliers", () => {
  it.each<[Persona, number]>([["owner", 200], ["designer", 200], ["other", 200], ...outsiders])("answers %s with %i", async (persona, status) => {
    const res = await listAs(persona);
    expect(res.status).toBe(status);
    if (status !== 200) expect(typeof res.body.error).toBe("string");
  });

  it("shows each studio only its own directory, by name, with contacts", async () => {
    const ours = await items("designer");
    expect(ours).toHaveLength(await countRows("supplier", `studio_id = '${STUDIO}' and archived_at is null`));
    expect(ours.map((s) => s.name)).toEqual([...ours.map((s) => s.name)].sort((a, b) => a.localeCompare(b)));
    expect(ours.every((s) => Array.isArray(s.contacts))).toBe(true);
    expect((await items("other")).map((s) => s.name)).toEqual(["Cobble & Slate"]);
  });

  it("answers 400 to a bad archived filter", async () => {
    expect((await listAs("designer", "?archived=maybe")).status).toBe(400);
  });
});

describe("POST /api/suppliers", () => {
  it.each(outsiders)("refuses %s with %i and writes nothing", async (persona, status) => {
    const before = await rowCounts();
    expect((await post(persona, newSupplier())).status).toBe(status);
    expect(await rowCounts()).toEqual(before);
  });

  it.each<Persona>(["owner", "designer"])("lets the %s add a supplier with contacts, in order, and audits it", async (persona) => {
    const res = await post(persona, newSupplier());
    expect(res.status).toBe(201);
    const made = res.body as unknown as Supplier;
    expect(made).toMatchObject({ trade: "electrician", archived: false, usage: { finishes: 0, specLines: 0, projectContacts: 0 } });
    expect(res.body.email).toBe("jobs@saltmarsh.example");
    expect(made.contacts.map((c) => [c.name, c.role])).toEqual([["Ada Quill", "Estimator"], ["Tomas Reed", "Site lead"]]);
    expect(made.contacts[1]?.email).toBeNull();
    expect(await countRows("audit_log", `action = 'supplier.created' and entity_type = 'supplier' and entity_id = '${made.id}'`)).toBe(1);
    expect((await listActiveSuppliers(STUDIO)).some((s) => s.id === made.id)).toBe(true);
  });

  it.each<[string, unknown, string]>([
    ["no name", { ...newSupplier(), name: "  " }, "name"],
    ["an unknown trade", newSupplier({ trade: "plasterer" }), "trade"],
    ["a bad e-mail", newSupplier({ email: "not-an-address" }), "email"],
    ["a contact with no name", newSupplier({ contacts: [{ name: "", email: "x@example.com" }] }), "contacts.0.name"],
    ["a contact's bad e-mail", newSupplier({ contacts: [{ name: "Ada" }, { name: "Bo", email: "bo@" }] }), "contacts.1.email"],
    ["too many contacts", newSupplier({ contacts: Array.from({ length: 31 }, (_, i) => ({ name: `P${i}` })) }), "contacts"],
    ["a long account number", newSupplier({ accountNumber: "9".repeat(61) }), "accountNumber"],
    ["not an object", ["Saltmarsh"], "_"],
  ])("answers 400 with field errors for %s, and writes nothing", async (_what, body, field) => {
    const before = await rowCounts();
    const res = await post("designer", body);
    expect(res.status).toBe(400);
    expect(Object.keys((res.body.fieldErrors ?? {}) as object)).toContain(field);
    expect(await rowCounts()).toEqual(before);
  });

  it("refuses a second supplier of the same name (any case) with 409 on the name field", async () => {
    const before = await rowCounts();
    const res = await post("designer", newSupplier({ name: "ridgeline STONEWORKS " }));
    expect(res.status).toBe(409);
    expect((res.body.fieldErrors as Record<string, string[]>).name?.[0]).toMatch(/already has a supplier called Ridgeline Stoneworks/);
    expect(await rowCounts()).toEqual(before);
  });
});

describe("GET /api/suppliers/:supplierId", () => {
  it.each<[Persona, number]>([["owner", 200], ["designer", 200], ["other", 404], ...outsiders])("answers %s with %i", async (persona, status) => {
    expect((await one(persona, STONE)).status).toBe(status);
  });

  it("answers 404 for another studio's supplier and for no such id", async () => {
    expect((await one("designer", THEIRS)).status).toBe(404);
    expect((await one("designer", "no-such-supplier")).status).toBe(404);
  });

  it("counts what names the supplier", async () => {
    const stone = (await one("designer", STONE)).body as unknown as Supplier;
    expect(stone.usage?.finishes).toBe(await countRows("finish", `supplier_id = '${STONE}'`));
    expect(stone.usage?.specLines).toBe(await countRows("spec_line", `supplier_id = '${STONE}'`));
    expect(stone.usage?.projectContacts).toBe(await countRows("project_member", `supplier_id = '${STONE}'`));
  });
});


describe("PATCH /api/suppliers/:supplierId", () => {
  it.each<[Persona, number]>([["other", 404], ...outsiders])("refuses %s with %i and changes nothing", async (persona, status) => {
    const before = await rowCounts();
    expect((await one(persona, STONE, { method: "PATCH", json: { name: "Taken over" } })).status).toBe(status);
    expect(await rowCounts()).toEqual(before);
    expect(((await one("designer", STONE)).body as unknown as Supplier).name).toBe("Ridgeline Stoneworks");
  });

  it("answers 404 when our designer names another studio's supplier", async () => {
    expect((await one("designer", THEIRS, { method: "PATCH", json: { notes: "x" } })).status).toBe(404);
  });

  it("changes fields and replaces the contact list: kept by id, changed, added, removed", async () => {
    const supplier = await made();
    const [ada, tomas] = supplier.contacts;
    const res = await one("owner", supplier.id, {
      method: "PATCH",
      json: { trade: "plumber", accountNumber: "", contacts: [{ name: "Mina Holt", role: "Accounts" }, { id: ada?.id, name: "Ada Quill-Moss", email: ada?.email }] },
    });
    expect(res.status).toBe(200);
    const after = res.body as unknown as Supplier;
    expect(after).toMatchObject({ trade: "plumber", accountNumber: null, notes: "Books site visits on Tuesdays." });
    expect(after.contacts.map((c) => c.name)).toEqual(["Mina Holt", "Ada Quill-Moss"]);
    expect(after.contacts[1]?.id).toBe(ada?.id);
    expect(await countRows("supplier_contact", `id = '${tomas?.id}'`)).toBe(0);
    expect(await countRows("audit_log", `action = 'supplier.updated' and entity_id = '${supplier.id}'`)).toBe(1);
  });

  it("never moves another supplier's contact: an id it doesn't own makes a new contact", async () => {
    const a = await made();
    const b = await made();
    const stolen = a.contacts[0]?.id;
    const res = await one("designer", b.id, { method: "PATCH", json: { contacts: [{ id: stolen, name: "Moved?" }] } });
    expect(res.status).toBe(200);
    expect((res.body as unknown as Supplier).contacts[0]?.id).not.toBe(stolen);
    expect(((await one("designer", a.id)).body as unknown as Supplier).contacts.map((c) => c.name)).toEqual(["Ada Quill", "Tomas Reed"]);
  });

  it.each<[string, unknown, string]>([
    ["a blank name", { name: "" }, "name"],
    ["an unknown trade", { trade: "roofer" }, "trade"],
    ["archived as text", { archived: "yes" }, "archived"],
    ["contacts that aren't a list", { contacts: "Ada" }, "contacts"],
  ])("answers 400 for %s and changes nothing", async (_what, json, field) => {
    const supplier = await made();
    const before = await rowCounts();
    const res = await one("designer", supplier.id, { method: "PATCH", json });
    expect(res.status).toBe(400);
    expect(Object.keys((res.body.fieldErrors ?? {}) as object)).toContain(field);
    expect(await rowCounts()).toEqual(before);
  });

  it("archives: gone from the list, listActiveSuppliers and new finishes' choices; back again with archived: false", async () => {
    const supplier = await made();
    expect((await one("designer", supplier.id, { method: "PATCH", json: { archived: true } })).body.archived).toBe(true);
    expect((await items("designer")).some((s) => s.id === supplier.id)).toBe(false);
    expect((await items("designer", "?archived=1")).find((s) => s.id === supplier.id)?.archived).toBe(true);
    expect((await listActiveSuppliers(STUDIO)).some((s) => s.id === supplier.id)).toBe(false);
    expect(await countRows("audit_log", `action = 'supplier.archived' and entity_id = '${supplier.id}'`)).toBe(1);
    await one("designer", supplier.id, { method: "PATCH", json: { archived: false } });
    expect((await listActiveSuppliers(STUDIO)).some((s) => s.id === supplier.id)).toBe(true);
    expect(await countRows("audit_log", `action = 'supplier.restored' and entity_id = '${supplier.id}'`)).toBe(1);
  });
});

describe("DELETE /api/suppliers/:supplierId", () => {
  it.each<[Persona, number]>([["other", 404], ...outsiders])("refuses %s with %i and deletes nothing", async (persona, status) => {
    const supplier = await made();
    expect((await one(persona, supplier.id, { method: "DELETE" })).status).toBe(status);
    expect(await countRows("supplier", `id = '${supplier.id}'`)).toBe(1);
  });

  it("answers 409 with the plain reason for a supplier with finishes, specification lines and a project contact", async () => {
    const before = await rowCounts();
    const res = await one("designer", STONE, { method: "DELETE" });
    expect(res.status).toBe(409);
    const finishes = await countRows("finish", `supplier_id = '${STONE}'`);
    const lines = await countRows("spec_line", `supplier_id = '${STONE}'`);
    expect(res.body.error).toBe(
      `Ridgeline Stoneworks has ${finishes} finishes in the library, ${lines} lines in issued specifications, 1 project contact and 1 acknowledged revision, so it can't be deleted; archive it instead.`,
    );
    expect(await rowCounts()).toEqual(before);
  });

  it("answers 409 for a supplier whose only tie is a person on a project", async () => {
    const supplier = await made();
    await runSql("insert into user (id, email) values ('it-user-sparky', 'sparky@saltmarsh.example')");
    await runSql("insert into project_member (id, project_id, user_id, role, supplier_id) values ('it-member-1', 'demo-project-marrow', 'it-user-sparky', 'supplier', ?)", [supplier.id]);
    const res = await one("owner", supplier.id, { method: "DELETE" });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/has 1 project contact, so it can't be deleted; archive it instead/);
  });

  it("deletes an unused supplier with its contacts (204), audits it, and then answers 404", async () => {
    const supplier = await made();
    const res = await one("designer", supplier.id, { method: "DELETE" });
    expect(res.status).toBe(204);
    expect(await countRows("supplier_contact", `supplier_id = '${supplier.id}'`)).toBe(0);
    expect(await countRows("audit_log", `action = 'supplier.deleted' and entity_id = '${supplier.id}'`)).toBe(1);
    expect((await one("designer", supplier.id)).status).toBe(404);
    expect((await one("designer", supplier.id, { method: "DELETE" })).status).toBe(404);
  });
});
