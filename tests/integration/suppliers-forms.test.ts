import { describe, expect, it, vi } from "vitest";
import { archiveSupplierAction, deleteSupplierAction, saveSupplierAction } from "@/app/studio/suppliers/actions";
import { listActiveSuppliers } from "@/db/queries/suppliers";
import { idle, type ActionResult } from "@/lib/actions/result";
import { countRows } from "@/tests/support/library";
import { actAs, type Persona } from "@/tests/support/session";
import { made, one, rowCounts, STONE, STUDIO, THEIRS, type SupplierAnswer } from "@/tests/support/supplier-calls";

// The supplier forms post to server actions with the supplier's id in a hidden input, so they
// work with JavaScript off (project rule, DEVELOPERS.md). A refused save sends back what was typed
// and field errors named as the form names its fields; 303-after-POST is common practice (and
// what Next's redirect() does for a no-JS post).
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

type Ended = { redirect: string } | { result: ActionResult };
type Action = (prev: ActionResult, form: FormData) => Promise<ActionResult>;

async function submit(persona: Persona, action: Action, fields: Record<string, string>): Promise<Ended> {
  actAs(persona);
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) form.set(key, value);
  try {
    return { result: await action(idle, form) };
  } catch (error) {
    const digest = String((error as { digest?: string }).digest ?? "");
    if (!digest.startsWith("NEXT_REDIRECT")) throw error;
    return { redirect: digest.split(";")[2] ?? "" };
  }
}

const company = { supplierId: "", name: "Brindle Tile Setting", trade: "tiles", email: "", phone: "0400 123 456", accountNumber: "", notes: "" };
const refused = (ended: Ended) => ("result" in ended && !ended.result.ok ? ended.result : null);

describe("the supplier form without JavaScript", () => {
  it("adds a supplier with the filled contact rows, ignoring the blank spare row, and opens its page", async () => {
    const ended = await submit("designer", saveSupplierAction, {
      ...company,
      "contacts.0.id": "", "contacts.0.name": "Ivo Marsh", "contacts.0.role": "Owner", "contacts.0.email": "", "contacts.0.phone": "0400 555 000",
      "contacts.1.id": "", "contacts.1.name": "", "contacts.1.role": "", "contacts.1.email": "", "contacts.1.phone": "",
    });
    expect(ended).toHaveProperty("redirect");
    const id = /^\/studio\/suppliers\/([\w-]+)\?added=1$/.exec("redirect" in ended ? ended.redirect : "")?.[1] ?? "";
    const saved = (await one("designer", id)).body as unknown as SupplierAnswer;
    expect(saved).toMatchObject({ name: "Brindle Tile Setting", trade: "tiles" });
    expect(saved.contacts.map((c) => [c.name, c.role, c.phone])).toEqual([["Ivo Marsh", "Owner", "0400 555 000"]]);
  });

  it("refuses a bad row with the error on that row's own field, keeps what was typed, and writes nothing", async () => {
    const before = await rowCounts();
    const fields = { ...company, name: "", "contacts.0.name": "", "contacts.0.email": "", "contacts.1.name": "Pia", "contacts.1.email": "pia@", "contacts.2.role": "Accounts" };
    const result = refused(await submit("designer", saveSupplierAction, fields));
    expect(result?.status).toBe(400);
    // Row 0 is blank (skipped), so row 1 is the first contact sent: its error must still say row 1.
    expect(Object.keys(result?.fieldErrors ?? {}).sort()).toEqual(["contacts.1.email", "contacts.2.name", "name"]);
    expect(result?.values).toMatchObject({ "contacts.1.email": "pia@", "contacts.2.role": "Accounts", phone: "0400 123 456" });
    expect(await rowCounts()).toEqual(before);
  });

  it("changes a supplier, dropping a contact ticked for removal", async () => {
    const supplier = await made();
    const [ada, tomas] = supplier.contacts;
    const ended = await submit("owner", saveSupplierAction, {
      ...company, supplierId: supplier.id, name: supplier.name, trade: "electrician",
      "contacts.0.id": ada?.id ?? "", "contacts.0.name": "Ada Quill",
      "contacts.1.id": tomas?.id ?? "", "contacts.1.name": "Tomas Reed", "contacts.1.remove": "1",
    });
    expect("redirect" in ended && ended.redirect.startsWith(`/studio/suppliers/${supplier.id}?saved=`)).toBe(true);
    const after = (await one("designer", supplier.id)).body as unknown as SupplierAnswer;
    expect(after.contacts.map((c) => c.id)).toEqual([ada?.id]);
    expect(after).toMatchObject({ phone: "0400 123 456", accountNumber: null });
  });

  it.each<[Persona, string, number]>([
    ["designer", THEIRS, 404],
    ["other", STONE, 404],
    ["client", STONE, 403],
    ["stone", STONE, 403],
    ["anonymous", STONE, 401],
  ])("refuses %s changing %s with %i and writes nothing", async (persona, supplierId, status) => {
    const before = await rowCounts();
    expect(refused(await submit(persona, saveSupplierAction, { ...company, supplierId }))?.status).toBe(status);
    expect(await rowCounts()).toEqual(before);
  });

  it("archives and brings back from the hidden-input form", async () => {
    const supplier = await made();
    await submit("designer", archiveSupplierAction, { supplierId: supplier.id, archived: "1" });
    expect((await listActiveSuppliers(STUDIO)).some((s) => s.id === supplier.id)).toBe(false);
    await submit("designer", archiveSupplierAction, { supplierId: supplier.id, archived: "0" });
    expect((await listActiveSuppliers(STUDIO)).some((s) => s.id === supplier.id)).toBe(true);
    expect(refused(await submit("other", archiveSupplierAction, { supplierId: supplier.id, archived: "1" }))?.status).toBe(404);
  });

  it("deletes only once the box is ticked, and never a supplier in use", async () => {
    const supplier = await made();
    expect(refused(await submit("designer", deleteSupplierAction, { supplierId: supplier.id }))?.fieldErrors?.confirm).toHaveLength(1);
    expect(await countRows("supplier", `id = '${supplier.id}'`)).toBe(1);
    const inUse = refused(await submit("designer", deleteSupplierAction, { supplierId: STONE, confirm: "yes" }));
    expect(inUse?.status).toBe(409);
    expect(inUse?.error).toMatch(/archive it instead/);
    expect(await submit("designer", deleteSupplierAction, { supplierId: supplier.id, confirm: "yes" })).toEqual({ redirect: "/studio/suppliers?deleted=1" });
    expect(await countRows("supplier", `id = '${supplier.id}'`)).toBe(0);
  });
});

describe("the CSV import offers to add the suppliers a file names", () => {
  const header = "Name,Category,Supplier,Unit,Unit price,Lead time (days),Colour";
  const rows = [
    "Fog Terrazzo,tile,Harrow Tile Co,m²,145,35,#cfcac0",
    "Fog Terrazzo Trim,tile,harrow tile co,m,30,35,#cfcac0",
    "Oat Paint,paint,,L,60,3,#e8e0d0",
  ];
  const check = async () => {
    const { POST: importCsv } = await import("@/app/api/finishes/import/route");
    const { call } = await import("@/tests/support/library");
    return (await call("designer", importCsv, "/api/finishes/import?dryRun=1", { method: "POST", text: [header, ...rows].join("\n") })).body;
  };

  it("names each missing supplier once (as first spelt), and passes once it is added", async () => {
    const first = await check();
    expect(first.missingSuppliers).toEqual(["Harrow Tile Co"]);
    expect(first.valid).toBe(1);
    await made({ name: "Harrow Tile Co", trade: "tiles", contacts: [] });
    const again = await check();
    expect(again).toMatchObject({ missingSuppliers: [], valid: 3, rejected: [] });
  });

  it("reads a file posted the way a browser posts it: a mixed-case multipart boundary (RFC 2045 §5.1)", async () => {
    const { POST: importCsv } = await import("@/app/api/finishes/import/route");
    actAs("designer");
    const boundary = "----WebKitFormBoundaryQ7xYtZ3mKp";
    const body = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="library.csv"\r\nContent-Type: text/csv\r\n\r\n${[header, ...rows].join("\n")}\r\n--${boundary}--\r\n`;
    const res = await importCsv(
      new Request("http://test/api/finishes/import?dryRun=1", { method: "POST", headers: { origin: "http://mottle.test", "content-type": `multipart/form-data; boundary=${boundary}` }, body }),
      {},
    );
    expect(res.status).toBe(200);
    expect(((await res.json()) as { total: number }).total).toBe(3);
  });

  it("refuses rows naming an archived supplier: archived ones are offered nowhere new", async () => {
    const harrow = (await listActiveSuppliers(STUDIO)).find((s) => s.name === "Harrow Tile Co");
    await one("designer", harrow?.id ?? "", { method: "PATCH", json: { archived: true } });
    const report = await check();
    expect(report.missingSuppliers).toEqual([]);
    expect(JSON.stringify(report.rejected)).toMatch(/Harrow Tile Co is archived/);
  });
});
