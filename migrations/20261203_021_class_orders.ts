import type { Knex } from 'knex'

// Every stored class carries its order, so readers never derive it from the mass dimension.
// Bases written before persistRun stored it (relativistic, mass-ratio rule) get
// order = dimension − 4; classes that have an order (heavy frame, newer bases) are untouched.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    WITH fixed AS (
      SELECT b.id, jsonb_agg(
        CASE WHEN jsonb_typeof(e.c) = 'object' AND (e.c -> 'order') IS NULL AND jsonb_typeof(e.c -> 'dimension') = 'number'
          THEN e.c || jsonb_build_object('order', (e.c ->> 'dimension')::int - 4)
          ELSE e.c END
        ORDER BY e.i) AS classes
      FROM bases b, jsonb_array_elements(b.classes) WITH ORDINALITY AS e(c, i)
      WHERE jsonb_typeof(b.classes) = 'array'
      GROUP BY b.id
    )
    UPDATE bases b SET classes = fixed.classes
    FROM fixed WHERE fixed.id = b.id AND fixed.classes IS DISTINCT FROM b.classes
  `)
}

// The orders stay: code from before this migration reads them as well.
export async function down(): Promise<void> {}
