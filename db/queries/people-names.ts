import { sql, type SQL } from "drizzle-orm";

/**
 * How a person is named on one project's screens and e-mails, for everyone who may see them:
 * a client or supplier's contact by the name this project's studio typed for them (else their
 * e-mail address, which the studio typed too); the studio's own staff by their own name; anyone
 * else (someone who declined, or left) by e-mail address. Never a member's `user.name`: that may
 * be the name another studio stored for the same person.
 *
 * `projectId` is a value, or an SQL expression naming the outer row's project column; `table` is
 * the name (or alias) under which the outer query joined `user`. Raw names inside: drizzle would
 * leave columns unqualified in a correlated subquery.
 */
export function nameOnProject(projectId: string | SQL, table = "user"): SQL<string> {
  const u = sql.identifier(table);
  return sql<string>`coalesce(
    (select coalesce(pm."display_name", ${u}."email") from "project_member" pm
      where pm."project_id" = ${projectId} and pm."user_id" = ${u}."id"),
    (select ${u}."name" from "studio_member" sm join "project" p on p."studio_id" = sm."studio_id"
      where p."id" = ${projectId} and sm."user_id" = ${u}."id"),
    ${u}."email")`;
}
