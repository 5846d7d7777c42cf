import type pg from "pg";

/**
 * What the server's own database login may do that it should not (D18): be a superuser, own
 * an object, hold TRUNCATE or TRIGGER on a table, or change rows of an append-only table (one
 * with a BEFORE TRUNCATE guard). Empty when the login is the least-privileged app role.
 */
export async function privilegeProblems(pool: pg.Pool): Promise<string[]> {
  const { rows } = await pool.query<{ problem: string }>(
    `WITH me AS (SELECT oid, rolname, rolsuper, rolcreaterole, rolcreatedb FROM pg_roles WHERE rolname = current_user)
     SELECT format('the login %s is a superuser', rolname) AS problem FROM me WHERE rolsuper
     UNION ALL SELECT format('the login %s may create roles or databases', rolname) FROM me WHERE rolcreaterole OR rolcreatedb
     UNION ALL SELECT format('the login owns %s', c.oid::regclass) FROM pg_class c, me
                WHERE c.relowner = me.oid AND c.relnamespace = 'public'::regnamespace
     UNION ALL SELECT format('the login may %s %s', lower(p), c.oid::regclass)
                 FROM pg_class c CROSS JOIN unnest(ARRAY['TRUNCATE', 'TRIGGER']) p
                WHERE c.relnamespace = 'public'::regnamespace AND c.relkind IN ('r', 'p')
                  AND has_table_privilege(current_user, c.oid, p)
     UNION ALL SELECT format('the login may %s rows of the append-only table %s', lower(p), c.oid::regclass)
                 FROM pg_class c CROSS JOIN unnest(ARRAY['UPDATE', 'DELETE']) p
                WHERE c.relnamespace = 'public'::regnamespace
                  AND EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND NOT g.tgisinternal AND (g.tgtype & 32) <> 0)
                  AND has_table_privilege(current_user, c.oid, p)`,
  );
  return rows.map((row) => row.problem);
}
