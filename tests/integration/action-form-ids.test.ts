import { describe, expect, it } from "vitest";
import { createBoardAction } from "@/app/studio/projects/[projectId]/boards/actions";
import { issueRevisionAction, removeFixedItemAction, saveFixedItemAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { idle } from "@/lib/actions/result";
import { actAs } from "@/tests/support/session";

// The studio's forms post their ids in hidden inputs (lib/actions/form-ids.ts), so a browser can
// send anything there. A missing or malformed id is answered like a wrong address (404) even to a
// designer who may write, before the body is read; another studio's project is 404 as before.
// Our own rule (see DEVELOPERS.md, Conventions), not an outside standard.
const project = "demo-project-marrow";

function formOf(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) form.set(key, value);
  return form;
}

const badProjectIds: Record<string, string>[] = [{}, { projectId: "" }, { projectId: "../demo-project-marrow" }, { projectId: "x".repeat(101) }];
const badItemIds = ["", "demo-fixed-oven' OR 1=1", "y".repeat(101)];
const body = { item: "Wall oven", roomId: "r", finishId: "f", quantity: "1", unit: "each", name: "Board" };

describe("ids posted by the studio's forms", () => {
  it("a missing or malformed project id is 404 for a designer who may write", async () => {
    actAs("designer");
    for (const ids of badProjectIds) {
      const results = [
        await saveFixedItemAction(idle, formOf({ ...ids, ...body })),
        await createBoardAction(idle, formOf({ ...ids, ...body })),
        await issueRevisionAction(idle, formOf(ids)),
        await removeFixedItemAction(idle, formOf({ ...ids, fixedItemId: "demo-fixed-oven" })),
      ];
      for (const result of results) expect(result).toMatchObject({ ok: false, status: 404 });
    }
  });

  it("a missing or malformed fixed item id is 404 (changing one needs a well-formed id; empty means a new item)", async () => {
    actAs("designer");
    for (const fixedItemId of badItemIds) {
      await expect(removeFixedItemAction(idle, formOf({ projectId: project, fixedItemId }))).resolves.toMatchObject({ ok: false, status: 404 });
      if (fixedItemId) await expect(saveFixedItemAction(idle, formOf({ projectId: project, fixedItemId, ...body }))).resolves.toMatchObject({ ok: false, status: 404 });
    }
  });

  it("another studio's designer is refused with 404 even with well-formed ids, and the typed text comes back", async () => {
    actAs("other");
    const result = await saveFixedItemAction(idle, formOf({ projectId: project, fixedItemId: "", item: "Wall oven" }));
    expect(result).toMatchObject({ ok: false, status: 404, values: { item: "Wall oven" } });
  });
});
