import { eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { finishes, projectInvitations, projectMembers, specLines, supplierAcknowledgements } from "@/db/schema";
import type { SupplierUsage } from "./supplier-dto";

type Reader = Pick<typeof db, "select">;
type Counted = typeof finishes | typeof specLines | typeof projectMembers | typeof projectInvitations | typeof supplierAcknowledgements;

/**
 * Everything that names the supplier. Fixed items name a finish, not a supplier, so they are held
 * through the finishes count.
 */
export async function countSupplierUsage(supplierId: string, reader: Reader = db): Promise<SupplierUsage> {
  const count = async (table: Counted) => {
    const [row] = await reader.select({ n: sql<number>`count(*)` }).from(table).where(eq(table.supplierId, supplierId));
    return Number(row?.n ?? 0);
  };
  const [finishCount, lineCount, memberCount, invitationCount, ackCount] = await Promise.all([
    count(finishes),
    count(specLines),
    count(projectMembers),
    count(projectInvitations),
    count(supplierAcknowledgements),
  ]);
  return { finishes: finishCount, specLines: lineCount, projectContacts: memberCount, invitations: invitationCount, acknowledgements: ackCount };
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Why a supplier can't be deleted, in plain words ("… has 12 finishes and 1 project contact; archive it instead"); null when nothing holds it. */
export function describeSupplierBlock(name: string, usage: SupplierUsage): string | null {
  const parts = [
    usage.finishes && plural(usage.finishes, "finish in the library", "finishes in the library"),
    usage.specLines && plural(usage.specLines, "line in an issued specification", "lines in issued specifications"),
    usage.projectContacts && plural(usage.projectContacts, "project contact", "project contacts"),
    usage.invitations && plural(usage.invitations, "invitation to a project", "invitations to projects"),
    usage.acknowledgements && plural(usage.acknowledgements, "acknowledged revision", "acknowledged revisions"),
  ].filter((p): p is string => Boolean(p));
  if (parts.length === 0) return null;
  const list = parts.length === 1 ? parts[0] : `${parts.slice(0, -1).join(", ")} and ${parts.at(-1)}`;
  return `${name} has ${list}, so it can't be deleted; archive it instead.`;
}
