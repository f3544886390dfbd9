import type { Knex } from 'knex'

// Deleted rows (deleted_at set: see migrations/20261203_090_soft_delete.ts) are hidden from
// every read. A theory is visible when neither it nor its group is deleted; a basis, note or
// tag also needs its own row not deleted. Queries name theories `t` and join groups as `g`.

/** Join the theory's group and keep only theories that are not deleted, in groups that are not. */
export function liveTheories(q: Knex.QueryBuilder, theory = 't'): Knex.QueryBuilder {
  return q.join('groups as g', 'g.id', `${theory}.group_id`).whereNull(`${theory}.deleted_at`).whereNull('g.deleted_at')
}
