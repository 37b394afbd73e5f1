import { describe, expect, it, vi } from "vitest";
import { GET as getList, POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { DELETE as deleteRevision, GET as getRevision, PATCH as patchRevision, PUT as putRevision } from "@/app/api/revisions/[revisionId]/route";
import { POST as addFixed } from "@/app/api/projects/[projectId]/fixed-items/route";
import { PATCH as patchFixed } from "@/app/api/projects/[projectId]/fixed-items/[fixedItemId]/route";
import { createDatabase } from "@/db/client";
import { sha256Hex } from "@/lib/spec/canonical";
import { readCaughtMail } from "@/lib/mail/caught";
import { writeAudit } from "@/db/queries/audit";
import type * as AuditModule from "@/db/queries/audit";
import { isRaceLost } from "@/db/queries/spec-issue";
import { actAsAny, call, project, revisionA } from "./spec-helpers";

// Wrapped so one test can make the last step of issuing fail and check nothing was half-written.
vi.mock("@/db/queries/audit", async (importOriginal) => {
  const original = await importOriginal<typeof AuditModule>();
  return { ...original, writeAudit: vi.fn(original.writeAudit) };
});

type Line = { lineKey: string; item: string; finishName: string; supplierId: string | null };
type Revision = { id: string; letter: string; sha256: string; verified: boolean; content: string; lines: Line[] };
type Changes = { added: Line[]; removed: Line[]; changed: { lineKey: string; changes: { field: string; before: unknown; after: unknown }[] }[] };

const read = async (id: string) => (await call(getRevision, { revisionId: id })).body as unknown as Revision & { changes: Changes | null };
const issueNext = () => call(issue, { projectId: project }, { method: "POST" });
const addItem = (item: string) =>
  call(addFixed, { projectId: project }, {
    method: "POST",
    body: { roomId: "demo-room-laundry", finishId: "demo-finish-light-downlight", item, location: "Ceiling", quantity: 2, unit: "each" },
  });

describe("issuing revisions", () => {
  let revisionB = "";

  it("keeps the demo's revision A verifiable: its stored hash is the SHA-256 of its content", async () => {
    actAsAny("designer");
    const a = await read(revisionA);
    expect(a.letter).toBe("A");
    expect(a.sha256).toBe(sha256Hex(a.content));
    expect(a.verified).toBe(true);
  });

  it("issues B from the current specification and shows what changed since A, line by line", async () => {
    actAsAny("designer");
    const res = await issueNext();
    expect(res.status).toBe(201);
    expect(res.body.letter).toBe("B");
    revisionB = String(res.body.id);
    const b = await read(revisionB);
    expect(b.verified).toBe(true);
    expect(b.sha256).toMatch(/^[0-9a-f]{64}$/);
    // The demo's laundry benchtop was varied after A: Graphite → Chalk porcelain (db/seed/demo-decisions.ts).
    const laundry = b.changes?.changed.find((c) => c.lineKey === "decision:demo-decision-laundry-benchtop");
    expect(laundry?.changes).toEqual(
      expect.arrayContaining([
        { field: "finishName", before: "Graphite Porcelain Slab", after: "Chalk Porcelain Slab" },
        { field: "productCode", before: "RS-PS-415", after: "RS-PS-402" },
      ]),
    );
    expect(b.changes?.added).toEqual([]);
    expect(b.changes?.removed).toEqual([]);
    // Open and chosen decisions (pendants, splashback, cabinets, ensuite floor) are never issued.
    expect(b.lines.map((l) => l.item)).not.toContain("Pendants over the island");
    expect(b.lines.map((l) => l.item)).not.toContain("Cabinet colour");
  });

  it("gives the same hash on every read and after the database is opened again", async () => {
    actAsAny("designer");
    const first = await read(revisionB);
    const second = await read(revisionB);
    expect(second.sha256).toBe(first.sha256);
    const { client, db } = createDatabase(process.env.DATABASE_URL ?? "");
    const row = await db.query.specRevisions.findFirst({ where: (r, { eq }) => eq(r.id, revisionB) });
    client.close();
    expect(row?.sha256).toBe(first.sha256);
    expect(sha256Hex(row?.content ?? "")).toBe(first.sha256);
  });

  it("refuses to issue when nothing changed (409), and issues C once something did", async () => {
    actAsAny("designer");
    expect((await issueNext()).status).toBe(409);
    const added = await addItem("Laundry downlights");
    expect(added.status).toBe(201);
    const c = await issueNext();
    expect(c.status).toBe(201);
    expect(c.body.letter).toBe("C");
    const view = await read(String(c.body.id));
    expect(view.changes?.added.map((l) => l.item)).toEqual(["Laundry downlights"]);
    const b = await read(revisionB);
    expect(view.sha256).not.toBe(b.sha256);

    // One field of one line changes → a new hash, and the diff names the field.
    expect((await call(patchFixed, { projectId: project, fixedItemId: String(added.body.id) }, { method: "PATCH", body: { quantity: 3 } })).status).toBe(200);
    const d = await issueNext();
    const viewD = await read(String(d.body.id));
    expect(viewD.sha256).not.toBe(view.sha256);
    expect(viewD.changes?.changed).toEqual([expect.objectContaining({ changes: [{ field: "quantity", before: 2, after: 3 }] })]);
    // Issued revisions kept what they froze.
    expect((await read(String(c.body.id))).sha256).toBe(view.sha256);
  });

  it("refuses edits to an issued revision (405) and leaves it as it was", async () => {
    actAsAny("designer");
    const before = await read(revisionB);
    for (const handler of [patchRevision, putRevision, deleteRevision]) {
      const res = await call(handler, { revisionId: revisionB }, { method: "PATCH", body: { lines: [] } });
      expect(res.status).toBe(405);
      expect(res.headers.get("allow")).toBe("GET");
      expect(res.body.error).toMatch(/never changes/);
    }
    expect((await read(revisionB)).sha256).toBe(before.sha256);
    expect((await read(revisionB)).lines).toEqual(before.lines);
  });

  it("gives consecutive letters or a 409 to concurrent issues, never one letter twice", async () => {
    actAsAny("designer");
    await addItem("Race item one");
    const results = await Promise.all([issueNext(), issueNext(), issueNext()]);
    const letters = results.filter((r) => r.status === 201).map((r) => String(r.body.letter));
    expect(results.every((r) => r.status === 201 || r.status === 409)).toBe(true);
    expect(letters.length).toBeGreaterThanOrEqual(1);
    expect(new Set(letters).size).toBe(letters.length);
    const list = (await call(getList, { projectId: project })).body.items as { letter: string; sequence: number }[];
    const sequences = list.map((r) => r.sequence).sort((a, b) => a - b);
    expect(sequences).toEqual(sequences.map((_, i) => i + 1));
    expect(new Set(list.map((r) => r.letter)).size).toBe(list.length);
  });

  it("e-mails each supplier with lines a link to their lines in the revision", async () => {
    actAsAny("designer");
    await addItem("Mail check downlights");
    const since = Date.now() - 50;
    const res = await issueNext();
    expect(res.status).toBe(201);
    const notified = res.body.notified as { supplierId: string; to: string; sent: boolean }[];
    expect(notified.map((n) => n.to).sort()).toEqual(["appliances@demo.example", "flooring@demo.example", "lighting@demo.example", "stone@demo.example"]);
    const dir = process.env.MAIL_CATCHER_DIR ?? "";
    const deadline = Date.now() + 5000;
    let mail = await readCaughtMail(dir, { to: "stone@demo.example" });
    while (!mail.some((m) => Date.parse(m.receivedAt) >= since - 1000 && m.subject.includes(String(res.body.letter))) && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 100));
      mail = await readCaughtMail(dir, { to: "stone@demo.example" });
    }
    const message = mail.find((m) => m.subject.includes(`Revision ${String(res.body.letter)} issued`));
    expect(message?.links).toContain(`http://mottle.test/supplier/revisions/${String(res.body.id)}`);
    expect(message?.text).toContain("2 lines");
    // Joinery and tiles have nothing locked yet, so they hear nothing.
    expect((await readCaughtMail(dir, { to: "joinery@demo.example" })).filter((m) => m.subject.includes("issued"))).toEqual([]);
  });

  it("never leaves a half-written revision: a failure at the last step undoes it all", async () => {
    actAsAny("designer");
    await addItem("Rollback check");
    const before = (await call(getList, { projectId: project })).body.items as { id: string }[];
    vi.mocked(writeAudit).mockRejectedValueOnce(new Error("disk full (simulated)"));
    const res = await issueNext();
    expect(res.status).toBe(500);
    const after = (await call(getList, { projectId: project })).body.items as { id: string }[];
    expect(after.map((r) => r.id)).toEqual(before.map((r) => r.id));
    const { client } = createDatabase(process.env.DATABASE_URL ?? "");
    const orphans = await client.execute("select count(*) as n from spec_line where revision_id not in (select id from spec_revision)");
    client.close();
    expect(Number(orphans.rows[0]?.n)).toBe(0);
    expect((await issueNext()).status).toBe(201);
  });

  it("maps the unique (project, sequence) index, the backstop across processes, to a lost race", async () => {
    const { client } = createDatabase(process.env.DATABASE_URL ?? "");
    const error = await client
      .execute({
        sql: "insert into spec_revision (id, project_id, letter, sequence, issued_by, content, sha256) values ('dup', ?, 'A', 1, 'demo-user-designer', '{}', 'x')",
        args: [project],
      })
      .then(() => null, (e: unknown) => e);
    client.close();
    expect(error).toBeInstanceOf(Error);
    expect(isRaceLost(error)).toBe(true);
    expect(isRaceLost(new Error("no such table"))).toBe(false);
  });

  // Last in the file: the libSQL connection that met the lock is not reliable for later writes.
  it("answers 409, writing nothing, when another process holds the database's write lock", async () => {
    actAsAny("designer");
    await addItem("Lock check");
    const before = ((await call(getList, { projectId: project })).body.items as unknown[]).length;
    // A second connection stands in for another server process writing at the same moment.
    const { client } = createDatabase(process.env.DATABASE_URL ?? "");
    const other = await client.transaction("write");
    try {
      const res = await issueNext();
      expect(res.status).toBe(409);
      expect(res.body.error).toMatch(/same moment/);
    } finally {
      await other.rollback();
      client.close();
    }
    expect(((await call(getList, { projectId: project })).body.items as unknown[]).length).toBe(before);
  }, 30_000);
});
