import { createClient } from "@libsql/client";

/** Reads the test database directly (for checks that a refused request wrote nothing). */
export async function queryRows(sql: string, args: (string | number | null)[] = []) {
  const client = createClient({ url: process.env.DATABASE_URL ?? "" });
  try {
    return (await client.execute({ sql, args })).rows;
  } finally {
    client.close();
  }
}

export async function auditActions(entityId: string): Promise<string[]> {
  const rows = await queryRows(`select action from audit_log where entity_id = ? order by created_at, rowid`, [entityId]);
  return rows.map((r) => String(r.action));
}
