import { createClient } from "@libsql/client";
import { describe, expect, it } from "vitest";
import { createDatabase } from "@/db/client";
import { seedDemo } from "@/db/seed/demo";

const url = () => process.env.DATABASE_URL ?? "";

async function count(table: string) {
  const client = createClient({ url: url() });
  const { rows } = await client.execute(`select count(*) as n from "${table}"`);
  client.close();
  return Number(rows[0]?.n);
}

describe("the database", () => {
  it("has foreign keys on and WAL for a file database", async () => {
    const client = createClient({ url: url() });
    expect((await client.execute("PRAGMA foreign_keys")).rows[0]?.foreign_keys).toBe(1);
    expect((await client.execute("PRAGMA journal_mode")).rows[0]?.journal_mode).toBe("wal");
    await expect(
      client.execute("insert into room (id, project_id, name) values ('r1', 'no-such-project', 'Kitchen')"),
    ).rejects.toThrow(/FOREIGN KEY/);
    client.close();
  });

  it("seeds the demo studio idempotently", async () => {
    const before = await Promise.all(["user", "finish", "decision", "spec_line", "approval"].map(count));
    const { client, db } = createDatabase(url());
    await seedDemo(db);
    client.close();
    const after = await Promise.all(["user", "finish", "decision", "spec_line", "approval"].map(count));
    expect(after).toEqual(before);
  });

  it("holds a demo library of about sixty finishes across every category", async () => {
    const client = createClient({ url: url() });
    const { rows } = await client.execute(
      "select category, count(*) as n from finish where studio_id = 'demo-studio-fernleaf' group by category",
    );
    client.close();
    const total = rows.reduce((sum, r) => sum + Number(r.n), 0);
    expect(total).toBeGreaterThanOrEqual(55);
    expect(rows.map((r) => r.category).sort()).toEqual(
      ["appliances", "cabinetry", "flooring", "hardware", "lighting", "paint", "stone", "tapware", "tile"],
    );
  });

  it("keeps money in integer cents", async () => {
    const client = createClient({ url: url() });
    const { rows } = await client.execute(
      "select count(*) as n from finish where unit_price_cents != cast(unit_price_cents as integer)",
    );
    client.close();
    expect(Number(rows[0]?.n)).toBe(0);
  });

  it("has decisions in every state for the demo", async () => {
    const client = createClient({ url: url() });
    const { rows } = await client.execute("select distinct status from decision order by status");
    const varied = await client.execute("select count(*) as n from variation where status = 'approved'");
    client.close();
    expect(rows.map((r) => r.status)).toEqual(["chosen", "locked", "open"]);
    expect(Number(varied.rows[0]?.n)).toBeGreaterThan(0);
  });
});
