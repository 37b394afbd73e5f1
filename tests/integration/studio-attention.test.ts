import { describe, expect, it } from "vitest";
import { countAttention, getStudioAttention } from "@/db/queries/attention";
import { getActor } from "@/db/queries/users";
import { attentionItems } from "@/components/attention/studio-attention";
import { runSql } from "@/tests/support/library";

// What waits on a studio (the brief for the studio home): decisions due within 14 days or late
// (open or chosen), variations to price, specifications changed since their latest revision,
// suppliers who have not acknowledged it, and lines late against their order-by date. The demo's
// dates are fixed, so "today" is passed in rather than read from the clock.
const today = "2026-12-02";
const marrow = "demo-project-marrow";

async function actor(userId: string) {
  const found = await getActor(userId);
  if (!found) throw new Error(`no actor ${userId}`);
  return found;
}

describe("the studio home's attention list", () => {
  it("is empty for a brand-new studio", async () => {
    await runSql(`insert into "user" ("id", "email", "name") values ('fresh-owner', 'fresh@studio.example', 'Ada Fresh')`);
    await runSql(`insert into "studio" ("id", "name") values ('fresh-studio', 'Fresh Studio')`);
    await runSql(`insert into "studio_member" ("studio_id", "user_id", "role") values ('fresh-studio', 'fresh-owner', 'owner')`);
    const attention = await getStudioAttention(await actor("fresh-owner"), today);
    expect(attention).toEqual({ due: [], toPrice: [], needsRevision: [], unacknowledged: [], late: [] });
    expect(countAttention(attention)).toBe(0);
  });

  it("names what waits on the demo studio, each with the page where it is dealt with", async () => {
    const attention = await getStudioAttention(await actor("demo-user-designer"), today);
    // Cabinet colour (chosen, due 8 Dec) and the pendants (open, due 14 Dec); the splashback is due 22 Dec, past 14 days.
    expect(attention.due.map((d) => [d.title, d.status])).toEqual([["Cabinet colour", "chosen"], ["Pendants over the island", "open"]]);
    expect(attention.toPrice.map((v) => v.title)).toEqual(["Benchtop"]);
    // The laundry variation was approved on 26 Nov, after revision A was issued on 19 Nov.
    expect(attention.needsRevision).toEqual([{ projectId: marrow, projectName: "Marrow Street terrace", lastLetter: "A" }]);
    // Stone acknowledged revision A; the other three suppliers with lines in it have not.
    expect(attention.unacknowledged.map((u) => [u.supplierName, u.letter, u.lineCount])).toEqual([
      ["Groundswell Floors", "A", 1],
      ["Hearthline Appliances", "A", 3],
      ["Lanternfield Lighting", "A", 1],
    ]);
    expect(attention.late).toEqual([]);
    const hrefs = attentionItems(attention, today).map((i) => i.href);
    expect(hrefs).toContain(`/studio/projects/${marrow}/decisions/demo-decision-kitchen-cabinets`);
    expect(hrefs).toContain(`/studio/projects/${marrow}/decisions/demo-decision-kitchen-benchtop/variations/demo-variation-kb`);
    expect(hrefs).toContain(`/studio/projects/${marrow}/specification`);
    expect(hrefs).toContain(`/studio/projects/${marrow}/handoff`);
  });

  it("lists lines not ordered by their order-by date (install 12 Apr 2027 minus 84 days' lead = 18 Jan)", async () => {
    const attention = await getStudioAttention(await actor("demo-user-designer"), "2027-01-20");
    expect(attention.late.map((l) => [l.item, l.kind, l.orderByDate])).toEqual([
      ["Cooktop", "order-overdue", "2027-01-18"],
      ["Rangehood", "order-overdue", "2027-01-18"],
      ["Wall oven", "order-overdue", "2027-01-18"],
    ]);
    // Decisions due by then are late, and say so.
    expect(attentionItems(attention, "2027-01-20").find((i) => i.key === "due-demo-decision-kitchen-cabinets")?.badge.tone).toBe("problem");
  });

  it("shows another studio none of these", async () => {
    const attention = await getStudioAttention(await actor("demo-user-other"), today);
    expect(countAttention(attention)).toBe(0);
  });

  it("clears the revision item once the next revision is issued, and raises it again when a fixed item changes", async () => {
    const { issueRevision } = await import("@/db/queries/spec-issue");
    const designer = await actor("demo-user-designer");
    await issueRevision(designer, marrow);
    const after = await getStudioAttention(designer, today);
    expect(after.needsRevision).toEqual([]);
    expect(after.unacknowledged.every((u) => u.letter === "B")).toBe(true);
    await runSql(
      `insert into "audit_log" ("id", "studio_id", "project_id", "actor_id", "action", "entity_type", "entity_id", "detail", "created_at")
       values ('audit-fixed-later', 'demo-studio-fernleaf', ?, 'demo-user-designer', 'fixed-item.changed', 'fixed_item', 'demo-fixed-oven', '{}', ?)`,
      [marrow, Date.now() + 1000],
    );
    expect((await getStudioAttention(designer, today)).needsRevision.map((s) => s.lastLetter)).toEqual(["B"]);
  });
});
