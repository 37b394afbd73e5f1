import { and, asc, eq, inArray, isNull, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { projectMembers, projects, rooms, studioMembers, suppliers, users } from "@/db/schema";
import { projectRole } from "@/lib/auth/permissions";
import { conflict, forbidden, HttpError, notFound } from "@/lib/http";
import type { InviteToProjectInput } from "@/lib/validation/auth";
import type { CreateProjectInput } from "@/lib/validation/project";
import { writeAudit } from "./audit";
import type { Actor } from "./users";

/** Projects this person may see: all of their studio's, plus those they belong to. */
export async function listProjectsForActor(actor: Actor) {
  const memberOf = actor.projects.map((p) => p.projectId);
  const visible = or(
    actor.studio ? eq(projects.studioId, actor.studio.id) : sql`0`,
    memberOf.length ? inArray(projects.id, memberOf) : sql`0`,
  );
  const rows = await db
    .select({
      id: projects.id,
      studioId: projects.studioId,
      name: projects.name,
      siteAddress: projects.siteAddress,
      installDate: projects.installDate,
      // Raw column names: inside a correlated subquery drizzle would leave them unqualified.
      openDecisions: sql<number>`(select count(*) from "decision" d where d."project_id" = "project"."id" and d."status" != 'locked')`,
      nextDue: sql<string | null>`(select min(d."due_date") from "decision" d where d."project_id" = "project"."id" and d."status" != 'locked')`,
    })
    .from(projects)
    .where(and(visible, isNull(projects.archivedAt)))
    .orderBy(asc(projects.installDate), asc(projects.name));
  return rows.map((row) => ({ ...row, role: projectRole(actor, row.id, row.studioId) }));
}

/** The one way to open a project: 404 when it doesn't exist or this person may not see it. */
export async function getProjectForActor(actor: Actor, projectId: string) {
  const project = await db.query.projects.findFirst({ where: eq(projects.id, projectId) });
  if (!project) throw notFound("That project");
  const role = projectRole(actor, project.id, project.studioId);
  if (!role) throw notFound("That project");
  return { project, role };
}

/** Studio staff only: a project to change, not just to read. */
export async function getProjectForStaff(actor: Actor, projectId: string) {
  const { project, role } = await getProjectForActor(actor, projectId);
  if (role !== "staff") throw forbidden();
  return project;
}

export async function listRooms(projectId: string) {
  return db.select().from(rooms).where(eq(rooms.projectId, projectId)).orderBy(asc(rooms.sortOrder), asc(rooms.name));
}

export async function listProjectPeople(projectId: string) {
  return db
    .select({
      id: projectMembers.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: projectMembers.role,
      supplierName: suppliers.name,
    })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .leftJoin(suppliers, eq(suppliers.id, projectMembers.supplierId))
    .where(eq(projectMembers.projectId, projectId))
    .orderBy(asc(projectMembers.role), asc(users.name));
}

/** A designer adds a client or a supplier's contact to a project; they sign in with an e-mailed link. */
export async function addProjectMember(actor: Actor, projectId: string, input: InviteToProjectInput) {
  const project = await getProjectForStaff(actor, projectId);
  if (input.role === "supplier") {
    const supplier = await db.query.suppliers.findFirst({
      where: and(eq(suppliers.id, input.supplierId ?? ""), eq(suppliers.studioId, project.studioId)),
    });
    if (!supplier) throw new HttpError(400, "Choose one of your studio's suppliers.", { supplierId: ["Choose one of your studio's suppliers."] });
  }
  return writeTransaction(async (tx) => {
    let user = await tx.query.users.findFirst({ where: eq(users.email, input.email) });
    if (user && (await isStudioStaff(tx, user.id))) {
      throw conflict("That e-mail address belongs to studio staff; staff see projects through their studio.");
    }
    if (!user) [user] = await tx.insert(users).values({ email: input.email, name: input.name }).returning();
    if (!user) throw new Error("member insert returned nothing");
    const existing = await tx.query.projectMembers.findFirst({
      where: and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, user.id)),
    });
    if (existing) throw conflict(`${input.email} is already on this project.`);
    const [member] = await tx
      .insert(projectMembers)
      .values({
        projectId,
        userId: user.id,
        role: input.role,
        supplierId: input.role === "supplier" ? (input.supplierId ?? null) : null,
        invitedBy: actor.userId,
      })
      .returning();
    await writeAudit(
      {
        studioId: project.studioId,
        projectId,
        actorId: actor.userId,
        action: `${input.role}.invited`,
        entityType: "user",
        entityId: user.id,
        detail: { email: input.email },
      },
      tx,
    );
    return { project, user, member };
  });
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

async function isStudioStaff(tx: Tx, userId: string) {
  return Boolean(await tx.query.studioMembers.findFirst({ where: eq(studioMembers.userId, userId) }));
}

/** A new project with its rooms, in one transaction. */
export async function createProject(actor: Actor, input: CreateProjectInput) {
  const studioId = actor.studio?.id;
  if (!studioId) throw forbidden();
  return writeTransaction(async (tx) => {
    const [project] = await tx
      .insert(projects)
      .values({ studioId, name: input.name, siteAddress: input.siteAddress || null, installDate: input.installDate || null })
      .returning();
    if (!project) throw new Error("project insert returned nothing");
    if (input.rooms.length) {
      await tx.insert(rooms).values(input.rooms.map((name, i) => ({ projectId: project.id, name, sortOrder: i })));
    }
    await writeAudit({ studioId, projectId: project.id, actorId: actor.userId, action: "project.created", entityType: "project", entityId: project.id }, tx);
    return project;
  });
}
