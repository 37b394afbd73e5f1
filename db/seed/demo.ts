import bcrypt from "bcryptjs";
import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { lightReflectance } from "@/lib/colour/luminance";
import { parseColour } from "@/lib/colour/parse-colour";
import { demoFinishes } from "./demo-finishes";
import { seedDemoProject } from "./demo-project";
import { demoId } from "./ids";

export const DEMO_PASSWORD = "mottle-demo";

const supplierRows = [
  { key: "stone", name: "Ridgeline Stoneworks", trade: "stone" },
  { key: "joinery", name: "Tallowwood Joinery", trade: "joinery" },
  { key: "flooring", name: "Groundswell Floors", trade: "flooring" },
  { key: "tiles", name: "Kiln Lane Tiles & Bathware", trade: "tiles" },
  { key: "lighting", name: "Lanternfield Lighting", trade: "lighting" },
  { key: "appliances", name: "Hearthline Appliances", trade: "appliances" },
] as const;

/** The invented demo studio (see README). Safe to run again: every row has a fixed id. */
export async function seedDemo(db: Database) {
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 11);
  const studio = demoId("studio", "fernleaf");
  const other = demoId("studio", "northwall");
  const user = (key: string) => demoId("user", key);

  await db.insert(t.studios).values([
    { id: studio, name: "Fernleaf Interiors" },
    { id: other, name: "Northwall Design Co." },
  ]).onConflictDoNothing();
  await db.insert(t.users).values([
    { id: user("owner"), email: "owner@demo.example", name: "Imogen Vale", passwordHash },
    { id: user("designer"), email: "designer@demo.example", name: "Rafe Lindqvist", passwordHash },
    { id: user("other"), email: "other@demo.example", name: "Bea Strand", passwordHash },
    { id: user("client"), email: "client@demo.example", name: "Noor Haddad" },
    { id: user("client2"), email: "client2@demo.example", name: "Callum Haddad" },
    { id: user("otherclient"), email: "otherclient@demo.example", name: "Wren Alcott" },
    ...supplierRows.map((s) => ({ id: user(s.key), email: `${s.key}@demo.example`, name: `${s.name} orders desk` })),
  ]).onConflictDoNothing();
  await db.insert(t.studioMembers).values([
    { studioId: studio, userId: user("owner"), role: "owner" as const },
    { studioId: studio, userId: user("designer"), role: "designer" as const },
    { studioId: other, userId: user("other"), role: "owner" as const },
  ]).onConflictDoNothing();
  await db.insert(t.suppliers).values(
    supplierRows.map((s) => ({ id: demoId("supplier", s.key), studioId: studio, name: s.name, trade: s.trade, email: `${s.key}@demo.example` })),
  ).onConflictDoNothing();
  await db.insert(t.suppliers).values({ id: demoId("supplier", "northwall-stone"), studioId: other, name: "Cobble & Slate", trade: "stone" }).onConflictDoNothing();

  await db.insert(t.finishes).values(
    demoFinishes.map((f) => {
      const [labL, labA, labB] = parseColour(f.hex);
      return {
        id: demoId("finish", f.key),
        studioId: studio,
        supplierId: f.supplier ? demoId("supplier", f.supplier) : null,
        name: f.name,
        category: f.category,
        productCode: f.code,
        surface: f.surface,
        format: f.format,
        unit: f.unit,
        unitPriceCents: f.price,
        leadTimeDays: f.leadDays,
        careNotes: f.care ?? null,
        cautions: f.cautions ?? [],
        labL, labA, labB,
        colourSource: "published" as const,
        lrv: f.lrv ?? Math.round(lightReflectance([labL, labA, labB]) * 10) / 10,
        lrvSource: f.lrv === undefined ? ("computed" as const) : ("published" as const),
      };
    }),
  ).onConflictDoNothing();
  const [oL, oA, oB] = parseColour("#d9d2c3");
  await db.insert(t.finishes).values({
    id: demoId("finish", "northwall-limestone"), studioId: other, name: "Harbour Limestone", category: "stone", productCode: "CS-01",
    unit: "m²", unitPriceCents: 61000, leadTimeDays: 21, labL: oL, labA: oA, labB: oB, colourSource: "published", lrv: 63, lrvSource: "computed",
  }).onConflictDoNothing();
  await db.insert(t.projects).values({ id: demoId("project", "quarry"), studioId: other, name: "Quarry Lane cottage", installDate: "2027-06-01" }).onConflictDoNothing();
  await db.insert(t.rooms).values({ id: demoId("room", "quarry-kitchen"), projectId: demoId("project", "quarry"), name: "Kitchen" }).onConflictDoNothing();
  // A client of another studio's project: isolation between clients can be seen and tested.
  await db.insert(t.projectMembers).values({ id: demoId("member", "otherclient"), projectId: demoId("project", "quarry"), userId: user("otherclient"), role: "client" }).onConflictDoNothing();

  await seedDemoProject(db, { studio, user, supplierKeys: supplierRows.map((s) => s.key) });
  // The demo's clients and suppliers have signed in before (they have made choices), and each
  // studio knows them by the name it typed: here, the name on their account.
  await db.run(sql`update "project_member" set "display_name" = (select u."name" from "user" u where u."id" = "project_member"."user_id")
    where "display_name" is null and "id" like 'demo-member-%'`);
  await db.run(sql`update "user" set "emailVerified" = ${Date.UTC(2026, 0, 5, 9)} where "emailVerified" is null and "password_hash" is null and "id" like 'demo-user-%'`);
}
