import { NextResponse } from "next/server";
import { listStudioSuppliers } from "@/db/queries/suppliers";
import { createSupplier } from "@/db/queries/supplier-writes";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { supplierInputSchema, supplierListQuerySchema } from "@/lib/validation/supplier";

/** The studio's suppliers and trades with their contacts, by name; `?archived=1` includes archived ones. */
export const GET = route(async (request) => {
  const actor = await requireApiUser("designer");
  const query = supplierListQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return NextResponse.json({ items: await listStudioSuppliers(actor, query) });
});

export const POST = route(async (request) => {
  const actor = await requireApiUser("designer");
  const input = supplierInputSchema.parse(await readJson(request));
  return NextResponse.json(await createSupplier(actor, input), { status: 201 });
});
