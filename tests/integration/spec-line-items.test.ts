import { describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as createDecision } from "@/app/api/projects/[projectId]/decisions/route";
import { POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { call, dayFromToday, demo } from "@/tests/support/decision-calls";
import { actAs } from "@/tests/support/session";

/**
 * A specification line is named for the item the trades will make ("Benchtop", "Waterfall end"),
 * as the designer named it on the option's line; a line left unnamed keeps the decision's title,
 * so revisions issued before lines had names read (and verify) as they did.
 */
type Revision = { verified: boolean; lines: { item: string; location: string | null; supplierName: string | null }[] };

describe("specification lines named for the item", () => {
  it("carries each option line's item name into the issued revision, and the title where none was given", async () => {
    actAs("designer");
    const title = "Island stone";
    const created = await call(createDecision, { projectId: demo.project }, {
      body: {
        room: demo.room("kitchen"),
        title,
        allowanceCents: 500000,
        dueDate: dayFromToday(20),
        notify: false,
        options: [
          {
            label: "Limestone, two pieces",
            lines: [
              { finishId: demo.finish("saltbush"), quantity: 3.2, unit: "m²", item: "Island benchtop", location: "Island" },
              { finishId: demo.finish("saltbush"), quantity: 0.9, unit: "m²", item: "Waterfall end", location: "Island, bin end" },
              { finishId: demo.finish("saltbush"), quantity: 0.3, unit: "m²", location: "Island, seat end" },
            ],
          },
          { label: "Quartzite", priceCents: 700000, lines: [{ finishId: demo.finish("quartzite-fog"), quantity: 4.4, unit: "m²" }] },
        ],
      },
    });
    expect(created.status).toBe(201);
    const id = String(created.body.id);
    const limestone = (created.body.options as { id: string; label: string }[]).find((o) => o.label.startsWith("Limestone"));

    actAs("client");
    const approved = await call(approve, { decisionId: id }, { body: { optionId: limestone?.id, confirm: true, version: created.body.version } });
    expect(approved.status).toBe(200);

    actAs("designer");
    const issued = await call(issue, { projectId: demo.project }, { body: {} });
    expect(issued.status).toBe(201);
    const revision = (await call(getRevision, { revisionId: String(issued.body.id) })).body as unknown as Revision;
    expect(revision.verified).toBe(true);
    const island = revision.lines.filter((l) => ["Island", "Island, bin end", "Island, seat end"].includes(l.location ?? "") && l.supplierName !== null && l.item !== "Cooktop");
    expect(island.map((l) => l.item).sort()).toEqual(["Island benchtop", title, "Waterfall end"].sort());
    expect(island.find((l) => l.location === "Island, seat end")?.item).toBe(title);
  });
});
