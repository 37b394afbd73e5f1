import { NextResponse } from "next/server";
import { getSupplier } from "@/db/queries/suppliers";
import { deleteSupplier, updateSupplier } from "@/db/queries/supplier-writes";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { supplierPatchSchema } from "@/lib/validation/supplier";

type Context = { params: Promise<{ supplierId: string }> };

/** One supplier with its contacts and what names it (`usage`); another studio's is 404. */
export const GET = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  return NextResponse.json(await getSupplier(actor, (await params).supplierId));
});

/** Any subset of the fields; `contacts` replaces the list; `{ "archived": true }` archives it, `false` brings it back. */
export const PATCH = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const patch = supplierPatchSchema.parse(await readJson(request));
  return NextResponse.json(await updateSupplier(actor, (await params).supplierId, patch));
});

/** Only a supplier nothing names can go; one with finishes, lines or project contacts answers 409. */
export const DELETE = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  await deleteSupplier(actor, (await params).supplierId);
  return new NextResponse(null, { status: 204 });
});
