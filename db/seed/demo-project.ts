import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { seedDemoActivity } from "./demo-activity";
import { seedDemoBoard } from "./demo-board";
import { seedDemoDecisions } from "./demo-decisions";
import { seedDemoRevision } from "./demo-revision";
import { seedDemoSpec } from "./demo-spec";
import { demoId } from "./ids";

type Ctx = { studio: string; user: (key: string) => string; supplierKeys: readonly string[] };

/** The client couple's terrace house: kitchen, laundry, ensuite. */
export async function seedDemoProject(db: Database, ctx: Ctx) {
  const project = demoId("project", "marrow");
  await db.insert(t.projects).values({
    id: project,
    studioId: ctx.studio,
    name: "Marrow Street terrace",
    siteAddress: "14 Marrow Street, Eastbrook",
    installDate: "2027-04-12",
    createdAt: new Date("2026-11-02T22:00:00Z"),
  }).onConflictDoNothing();
  await db.insert(t.rooms).values([
    { id: demoId("room", "kitchen"), projectId: project, name: "Kitchen", sortOrder: 0 },
    { id: demoId("room", "laundry"), projectId: project, name: "Laundry", sortOrder: 1 },
    { id: demoId("room", "ensuite"), projectId: project, name: "Ensuite", sortOrder: 2 },
  ]).onConflictDoNothing();
  await db.insert(t.projectMembers).values([
    { id: demoId("member", "client"), projectId: project, userId: ctx.user("client"), role: "client" as const, invitedBy: ctx.user("designer") },
    { id: demoId("member", "client2"), projectId: project, userId: ctx.user("client2"), role: "client" as const, invitedBy: ctx.user("designer") },
    ...ctx.supplierKeys.map((key) => ({
      id: demoId("member", key),
      projectId: project,
      userId: ctx.user(key),
      role: "supplier" as const,
      supplierId: demoId("supplier", key),
      invitedBy: ctx.user("designer"),
    })),
  ]).onConflictDoNothing();
  await seedDemoBoard(db, project);
  await seedDemoDecisions(db, { project, user: ctx.user });
  await seedDemoSpec(db);
  await seedDemoRevision(db, { studio: ctx.studio, project, user: ctx.user });
  await seedDemoActivity(db, { studio: ctx.studio, project, user: ctx.user });
}
