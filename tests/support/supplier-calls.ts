import { DELETE as deleteOne, GET as getOne, PATCH as patchOne } from "@/app/api/suppliers/[supplierId]/route";
import { GET as list, POST as create } from "@/app/api/suppliers/route";
import { call, countRows } from "./library";
import type { Persona } from "./session";

export type Contact = { id: string; name: string; email: string | null; phone: string | null; role: string | null };
export type SupplierAnswer = { id: string; name: string; trade: string; archived: boolean; contacts: Contact[]; usage?: Record<string, number> };

export const STUDIO = "demo-studio-fernleaf";
export const STONE = "demo-supplier-stone";
/** The other studio's (Northwall's) supplier. */
export const THEIRS = "demo-supplier-northwall-stone";

export const listAs = (persona: Persona, query = "") => call(persona, list, `/api/suppliers${query}`);
export const items = async (persona: Persona, query = "") => ((await listAs(persona, query)).body.items ?? []) as SupplierAnswer[];
export const one = (persona: Persona, id: string, init: { method?: "GET" | "PATCH" | "DELETE"; json?: unknown } = {}) =>
  call(persona, init.method === "PATCH" ? patchOne : init.method === "DELETE" ? deleteOne : getOne, `/api/suppliers/${id}`, { ...init, params: { supplierId: id } });
export const post = (persona: Persona, json: unknown) => call(persona, create, "/api/suppliers", { json });

/** Suppliers, contacts and supplier audit rows: a refused request changes none of them. */
export const rowCounts = async () => [await countRows("supplier"), await countRows("supplier_contact"), await countRows("audit_log", "entity_type = 'supplier'")];

let n = 0;
/** A valid new supplier (invented), a fresh name each time. */
export const newSupplier = (extra: Record<string, unknown> = {}) => ({
  name: `Saltmarsh Electrical ${++n}`,
  trade: "electrician",
  email: "Jobs@Saltmarsh.example",
  phone: "0400 000 111",
  accountNumber: "FERN-0042",
  notes: "Books site visits on Tuesdays.",
  contacts: [
    { name: "Ada Quill", email: "ada@saltmarsh.example", role: "Estimator" },
    { name: "Tomas Reed", phone: "0400 000 222", role: "Site lead" },
  ],
  ...extra,
});

/** Adds a supplier as the designer and answers it. */
export async function made(extra: Record<string, unknown> = {}): Promise<SupplierAnswer> {
  const res = await post("designer", newSupplier(extra));
  if (res.status !== 201) throw new Error(`supplier not created: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as unknown as SupplierAnswer;
}
