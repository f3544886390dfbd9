import type { Knex } from 'knex'

// Theory files now name each field's Lorentz kind in words ("scalar", "left-weyl",
// "right-weyl", "field-strength") instead of one letter. Rewrite every stored theory file:
// the theories themselves and the copy each run froze into its params. The mapping is written
// out here (not imported) so this migration stays what it was when it was applied.
const WORDS: Record<string, string> = { S: 'scalar', L: 'left-weyl', R: 'right-weyl', F: 'field-strength' }
const LETTERS: Record<string, string> = Object.fromEntries(Object.entries(WORDS).map(([l, w]) => [w, l]))

/** Places that hold a theory file: table, jsonb column, path of the file inside it. */
const PLACES: { table: string, column: string, path: string[] }[] = [
  { table: 'theories', column: 'definition', path: [] },
  { table: 'runs', column: 'params', path: ['theory'] },
]

/**
 * Replace `lorentz` in every field object of the file at `path` by mapping[lorentz], leaving
 * other values (and files without a fields array) untouched. One statement per place.
 */
async function rewriteLorentz(knex: Knex, mapping: Record<string, string>): Promise<void> {
  const map = JSON.stringify(mapping)
  for (const { table, column, path } of PLACES) {
    const fieldsPath = `{${[...path, 'fields'].join(',')}}`
    await knex.raw(`
      WITH fixed AS (
        SELECT t.id, jsonb_agg(
          CASE WHEN jsonb_typeof(e.f) = 'object' AND (?::jsonb -> (e.f ->> 'lorentz')) IS NOT NULL
            THEN jsonb_set(e.f, '{lorentz}', ?::jsonb -> (e.f ->> 'lorentz'))
            ELSE e.f END
          ORDER BY e.i) AS fields
        FROM ?? t, jsonb_array_elements(t.?? #> ?::text[]) WITH ORDINALITY AS e(f, i)
        WHERE jsonb_typeof(t.?? #> ?::text[]) = 'array'
        GROUP BY t.id
      )
      UPDATE ?? t SET ?? = jsonb_set(t.??, ?::text[], fixed.fields)
      FROM fixed WHERE fixed.id = t.id AND fixed.fields IS DISTINCT FROM t.?? #> ?::text[]
    `, [map, map, table, column, fieldsPath, column, fieldsPath, table, column, column, fieldsPath, column, fieldsPath])
  }
}

export async function up(knex: Knex): Promise<void> {
  await rewriteLorentz(knex, WORDS)
}

export async function down(knex: Knex): Promise<void> {
  await rewriteLorentz(knex, LETTERS)
}
