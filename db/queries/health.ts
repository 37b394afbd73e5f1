import { sql } from "drizzle-orm";
import { db } from "@/db";

/** One trivial read, so a health check proves the database answers. */
export async function pingDatabase(): Promise<boolean> {
  const rows = await db.all<{ ok: number }>(sql`select 1 as ok`);
  return rows[0]?.ok === 1;
}
