import { and, asc, desc, eq, inArray, max, ne, or } from "drizzle-orm";
import { db } from "@/db";
import { approvals, decisions, finishes, optionLines, options, projects, rooms, specRevisions, studios, users, variations, type Decision, type Project } from "@/db/schema";
import { projectRole } from "@/lib/auth/permissions";
import { summariseBudget } from "@/lib/decisions/budget";
import { suggestOrderBy, type OrderBySuggestion } from "@/lib/decisions/order-by";
import { readAccessStandard } from "@/lib/boards/check-settings";
import type { ThresholdOverrides } from "@/lib/colour";
import { readStudioThresholds } from "@/lib/decisions/thresholds";
import type { DecisionListItem } from "@/lib/decisions/types";
import { forbidden, notFound } from "@/lib/http";
import { loadBudgetDecisions, loadLatestChoices } from "./decision-budget";
import { nameOnProject } from "./people-names";
import { getProjectForActor } from "./projects";
import type { Actor } from "./users";

type Reader = Pick<typeof db, "select">;

export type DecisionAccess = { decision: Decision; project: Project; role: "staff" | "client" };

/**
 * The one way to open a decision: 404 when it doesn't exist or its project isn't this person's,
 * 403 for a supplier (suppliers never see options or prices meant for the client).
 */
export async function getDecisionAccess(actor: Actor, decisionId: string, reader: Reader = db): Promise<DecisionAccess> {
  const [row] = await reader
    .select({ decision: decisions, project: projects })
    .from(decisions)
    .innerJoin(projects, eq(projects.id, decisions.projectId))
    .where(eq(decisions.id, decisionId))
    .limit(1);
  if (!row) throw notFound("That decision");
  const role = projectRole(actor, row.project.id, row.project.studioId);
  if (!role) throw notFound("That decision");
  if (role === "supplier") throw forbidden();
  return { ...row, role };
}

/** A project whose decisions this person may read: staff and the project's clients. */
export async function getProjectForDecisions(actor: Actor, projectId: string) {
  const { project, role } = await getProjectForActor(actor, projectId);
  if (role === "supplier") throw forbidden();
  return { project, role };
}

/** The studio's check settings over the defaults, with the access standard it follows (AS 1428.1 unless chosen). */
export async function getStudioThresholds(studioId: string, reader: Reader = db): Promise<ThresholdOverrides> {
  const [studio] = await reader.select({ checkSettings: studios.checkSettings, accessStandard: studios.accessStandard }).from(studios).where(eq(studios.id, studioId));
  return { ...readStudioThresholds(studio?.checkSettings), accessStandard: readAccessStandard(studio?.accessStandard) };
}

/**
 * Order-by dates: a locked decision's from the finishes of the option it carries (the locked one,
 * or the option an approved variation put in its place), the same lines the specification issues;
 * an open one's from every option still offered, since the client may pick any.
 */
export async function loadOrderBy(decisionIds: string[], installDate: string | null, reader: Reader = db) {
  const out = new Map<string, OrderBySuggestion | null>();
  if (decisionIds.length === 0) return out;
  const rows = await reader
    .select({ decisionId: options.decisionId, name: finishes.name, leadTimeDays: finishes.leadTimeDays })
    .from(optionLines)
    .innerJoin(options, eq(options.id, optionLines.optionId))
    .innerJoin(decisions, eq(decisions.id, options.decisionId))
    .innerJoin(finishes, eq(finishes.id, optionLines.finishId))
    .where(
      and(
        inArray(options.decisionId, decisionIds),
        or(
          and(eq(decisions.status, "locked"), eq(options.id, decisions.lockedOptionId)),
          and(ne(decisions.status, "locked"), eq(options.addedByVariation, false)),
        ),
      ),
    );
  for (const id of decisionIds) out.set(id, suggestOrderBy(installDate, rows.filter((r) => r.decisionId === id)));
  return out;
}

/** A project's decisions, soonest due first, with where each stands and the running budget. */
export async function listDecisionsForProject(actor: Actor, projectId: string) {
  const { project, role } = await getProjectForDecisions(actor, projectId);
  const rows = await db
    .select({ decision: decisions, roomName: rooms.name })
    .from(decisions)
    .innerJoin(rooms, eq(rooms.id, decisions.roomId))
    .where(eq(decisions.projectId, project.id))
    .orderBy(asc(decisions.dueDate), asc(decisions.title));
  const ids = rows.map((r) => r.decision.id);
  const [optionRows, latest, openVariations, orderBy, budgetRows, approvers] = await Promise.all([
    ids.length ? db.select({ id: options.id, decisionId: options.decisionId, label: options.label, priceCents: options.priceCents, addedByVariation: options.addedByVariation }).from(options).where(inArray(options.decisionId, ids)) : [],
    loadLatestChoices(ids),
    ids.length
      ? db.select({ decisionId: variations.decisionId, status: variations.status }).from(variations)
          .where(and(inArray(variations.decisionId, ids), or(eq(variations.status, "requested"), eq(variations.status, "priced"))))
      : [],
    loadOrderBy(ids, project.installDate),
    loadBudgetDecisions(project.id),
    loadApproverNames(ids, project.id),
  ]);
  const items: DecisionListItem[] = rows.map(({ decision: d, roomName }) => {
    const currentId = d.status === "locked" ? d.lockedOptionId : d.status === "chosen" ? latest.get(d.id)?.optionId : null;
    const current = optionRows.find((o) => o.id === currentId);
    return {
      id: d.id,
      title: d.title,
      roomId: d.roomId,
      roomName,
      dueDate: d.dueDate,
      status: d.status,
      allowanceCents: d.allowanceCents,
      optionCount: optionRows.filter((o) => o.decisionId === d.id && !o.addedByVariation).length,
      currentOption: current ? { id: current.id, label: current.label, priceCents: current.priceCents } : null,
      approvedBy: approvers.get(d.id) ?? null,
      openVariation: openVariations.find((v) => v.decisionId === d.id)?.status ?? null,
      orderBy: orderBy.get(d.id) ?? null,
    };
  });
  return { project, role, items, budget: summariseBudget([...budgetRows.values()]) };
}

async function loadApproverNames(decisionIds: string[], projectId: string) {
  const out = new Map<string, string>();
  if (decisionIds.length === 0) return out;
  const rows = await db
    .select({ decisionId: approvals.decisionId, name: nameOnProject(projectId), email: users.email })
    .from(approvals)
    .innerJoin(users, eq(users.id, approvals.userId))
    .where(inArray(approvals.decisionId, decisionIds))
    .orderBy(desc(approvals.approvedAt));
  // Latest approver per decision: after a variation, the person who approved the change.
  for (const r of rows) if (!out.has(r.decisionId)) out.set(r.decisionId, r.name ?? r.email);
  return out;
}

/** True when an approved variation is newer than the project's latest issued revision. */
export async function specNeedsRevision(projectId: string, decisionId: string, reader: Reader = db) {
  const [latest] = await reader.select({ issuedAt: max(specRevisions.issuedAt) }).from(specRevisions).where(eq(specRevisions.projectId, projectId));
  if (!latest?.issuedAt) return false;
  const [newest] = await reader
    .select({ decidedAt: max(variations.decidedAt) })
    .from(variations)
    .where(and(eq(variations.decisionId, decisionId), eq(variations.status, "approved")));
  const decided = newest?.decidedAt;
  return decided != null && new Date(decided).getTime() > new Date(latest.issuedAt).getTime();
}
