import knexFactory from 'knex'

/** Row count and a digest of every row (as text, sorted) of one table. */
export interface TableState {
  rows: number
  digest: string
}
export interface DatabaseState {
  tables: Record<string, TableState>
  sequences: Record<string, string>
}

/**
 * Every table of the app's schemas (public and the queue's pgboss) with its row count and the
 * md5 of all its rows in text form, sorted; and every sequence's position. Two databases with
 * equal states hold the same rows.
 */
export async function databaseState(url: string): Promise<DatabaseState> {
  const db = knexFactory({ client: 'pg', connection: url, pool: { min: 0, max: 1 } })
  try {
    const { rows: tables } = await db.raw(`SELECT table_schema AS s, table_name AS t FROM information_schema.tables
      WHERE table_schema IN ('public', 'pgboss') AND table_type = 'BASE TABLE' ORDER BY 1, 2`)
    const state: DatabaseState = { tables: {}, sequences: {} }
    for (const { s, t } of tables as { s: string; t: string }[]) {
      const {
        rows: [r],
      } = await db.raw(`SELECT count(*)::int AS rows, md5(coalesce(string_agg(x::text, E'\\n' ORDER BY x::text), '')) AS digest FROM ??.?? x`, [s, t])
      state.tables[`${s}.${t}`] = { rows: r.rows, digest: r.digest }
    }
    const { rows: seqs } = await db.raw(`SELECT schemaname AS s, sequencename AS n, coalesce(last_value::text, 'unused') AS v FROM pg_sequences WHERE schemaname IN ('public', 'pgboss') ORDER BY 1, 2`)
    for (const { s, n, v } of seqs as { s: string; n: string; v: string }[]) state.sequences[`${s}.${n}`] = v
    return state
  } finally {
    await db.destroy()
  }
}

/** Only the app's own tables (public schema) of a state. */
export function publicTables(state: DatabaseState): Record<string, TableState> {
  return Object.fromEntries(Object.entries(state.tables).filter(([name]) => name.startsWith('public.')))
}
