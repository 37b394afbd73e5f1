import { describe, expect, it, vi } from "vitest";
import { GET as getBoard } from "@/app/api/boards/[boardId]/route";
import { GET as getDecision } from "@/app/api/decisions/[decisionId]/route";
import { GET, PATCH } from "@/app/api/studio/settings/route";
import { saveStudioSettingsAction } from "@/app/studio/settings/actions";
import { idle } from "@/lib/actions/result";
import type { BoardView } from "@/lib/boards/types";
import type { DecisionView } from "@/lib/decisions/types";
import { call, demo } from "@/tests/support/decision-calls";
import { actAs } from "@/tests/support/session";
import { BOARD, callRoute, sql } from "./boards-support";

// Outside a request Next has no cache to refresh.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const studio = "demo-studio-fernleaf";
const patch = (body: unknown) => call(PATCH, {}, { method: "PATCH", body });
const standardNow = async () => (await sql<{ s: string }>("select access_standard as s from studio where id = ?", [studio]))[0]?.s;

async function board(): Promise<BoardView> {
  actAs("designer");
  const res = await callRoute(getBoard, `/api/boards/${BOARD}`, { boardId: BOARD });
  expect(res.status).toBe(200);
  return res.body as unknown as BoardView;
}
const floorKick = async () => (await board()).checks.find((c) => c.pairId === "demo-pair-floor-kick");

async function benchtopChecks() {
  actAs("client");
  const res = await call(getDecision, { decisionId: demo.benchtop });
  expect(res.status).toBe(200);
  const option = (res.body as unknown as DecisionView).options.find((o) => o.checks.source === "board");
  if (!option) throw new Error("the benchtop decision has an option shown on the sample board");
  return option.checks;
}

describe("the studio's access standard: one rule, chosen in settings", () => {
  it("is AS 1428.1 by default, and every staff member reads it", async () => {
    for (const persona of ["owner", "designer"] as const) {
      actAs(persona);
      expect((await call(GET, {})).body).toMatchObject({ accessStandard: "as1428" });
    }
  });

  it("only the owner changes it; a designer is refused and an unknown standard is a field error", async () => {
    actAs("designer");
    expect((await patch({ accessStandard: "bs8300" })).status).toBe(403);
    expect((await saveStudioSettingsAction(idle, form({ section: "access", accessStandard: "bs8300" }))).ok).toBe(false);
    actAs("owner");
    const bad = await patch({ accessStandard: "ada" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fieldErrors as object)).toEqual(["accessStandard"]);
    expect(await standardNow()).toBe("as1428");
  });

  it("changing it alone leaves the rates and every price alone, and is audited", async () => {
    actAs("owner");
    const reply = await patch({ accessStandard: "both" });
    expect(reply.status).toBe(200);
    expect(reply.body).toMatchObject({ accessStandard: "both", markupBasisPoints: 0, taxBasisPoints: 1000, repriced: { options: 0, decisions: 0 } });
    const [audit] = await sql<{ before: string; after: string }>(
      "select json_extract(detail, '$.before.accessStandard') as before, json_extract(detail, '$.after.accessStandard') as after from audit_log where action = 'studio.settings.changed' order by created_at desc limit 1",
    );
    expect(audit).toEqual({ before: "as1428", after: "both" });
    expect((await patch({ accessStandard: "as1428" })).status).toBe(200);
  });

  // A dark pair: LRV 35 against LRV 10. Bowman–Sapolinski as quoted for AS 1428.1 gives
  // 125 × 25 / 70 = 44.6 %, over its 30 % [published, as quoted]; the two are 25 LRV points apart,
  // under BS 8300-2's 30 [published, as quoted].
  it("switches a board's verdict on the pair the two standards disagree about, naming the standard", async () => {
    await sql("update finish set lrv = 35, lrv_source = 'published' where id = 'demo-finish-floor-oak-herringbone'");
    await sql("update finish set lrv = 10, lrv_source = 'published' where id = 'demo-finish-cab-ink'");

    const as = await floorKick();
    expect(as).toMatchObject({ verdict: "pass", decidedBy: "access", figures: { luminanceContrast: "45", lrvDifference: "25" } });
    expect(as?.reason).toBe("Passes AS 1428.1: 45 % luminance contrast, 30 % needed. Enough light–dark difference for people with low vision.");

    actAs("owner");
    expect((await patch({ accessStandard: "bs8300" })).status).toBe(200);
    const bs = await floorKick();
    expect(bs?.verdict).toBe("fail");
    expect(bs?.reason).toMatch(/^Fails BS 8300-2: 25 LRV points apart, 30 needed\. Too little light–dark difference/);

    actAs("owner");
    expect((await saveStudioSettingsAction(idle, form({ section: "access", accessStandard: "both" }))).ok).toBe(true);
    expect(await standardNow()).toBe("both");
    const both = await floorKick();
    expect(both?.verdict).toBe("fail");
    expect(both?.reason).toMatch(/^Fails BS 8300-2: 25 LRV points apart, 30 needed\. Passes AS 1428\.1: 45 % luminance contrast, 30 % needed\./);

    actAs("owner");
    await patch({ accessStandard: "as1428" });
    expect((await floorKick())?.verdict).toBe("pass");
  });

  // Benchtop edge against the floor: Saltbush (published LRV 64) on Light Oak Herringbone (35 above):
  // 125 × 29 / 124 = 29.2 % (shown "29 %": already below 30) by AS 1428.1's formula as quoted, 29 LRV points by BS 8300-2's measure.
  it("switches the checks a client sees on a decision shown on that board", async () => {
    const as = await benchtopChecks();
    const edge = () => (as.shown.find((c) => c.between === "Benchtop and Floor"));
    expect(edge()?.verdict).toBe("fail");
    expect(edge()?.reason).toMatch(/^Fails AS 1428\.1: 29 % luminance contrast, 30 % needed\./);
    expect(as.shown.every((c) => !c.reason.includes("BS 8300-2"))).toBe(true);

    actAs("owner");
    await patch({ accessStandard: "bs8300" });
    const bs = await benchtopChecks();
    const bsEdge = bs.shown.find((c) => c.between === "Benchtop and Floor");
    expect(bsEdge?.reason).toMatch(/^Fails BS 8300-2: 29 LRV points apart, 30 needed\./);
    expect(bs.shown.every((c) => !c.reason.includes("AS 1428.1"))).toBe(true);
    actAs("owner");
    await patch({ accessStandard: "as1428" });
  });
});

function form(fields: Record<string, string>) {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.set(k, v);
  return f;
}
