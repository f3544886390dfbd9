import type { Knex } from 'knex'
import { DEMO_ADMIN, DEMO_GROUP, DEMO_MEMBERS, DEMO_PASSWORD } from './demoPeople'
import { DEMO_THEORIES, DEMO_RUNS, DEMO_LADDER } from './demoTheories'
import { LadderDocumentSchema } from '../shared/schemas/scaleRequests'
import { parseTheory } from '../server/engine/theory/parseTheory'

/**
 * Seed the demo into an empty database (does nothing when any account exists).
 * `hash` is the app's password hasher, passed in so that seeding stays framework-free.
 */
export async function seedDemo(db: Knex, hash: (password: string) => Promise<string>, enqueue?: (runId: number) => Promise<string | null>): Promise<boolean> {
  const existing = await db('users').count<{ count: string }[]>('id as count')
  if (Number(existing[0]!.count) > 0) return false
  const passwordHash = await hash(DEMO_PASSWORD)
  await db.transaction(async (trx) => {
    await trx('users').insert({ email: DEMO_ADMIN.email, display_name: DEMO_ADMIN.displayName, password_hash: passwordHash, site_role: 'admin' })
    const [group] = await trx('groups').insert(DEMO_GROUP).returning('id')
    for (const member of DEMO_MEMBERS) {
      const [user] = await trx('users').insert({ email: member.email, display_name: member.displayName, password_hash: passwordHash }).returning('id')
      await trx('memberships').insert({ group_id: group.id, user_id: user.id, role: member.role })
    }
    const owner = await trx('users').where({ email: DEMO_MEMBERS[0].email }).first('id')
    for (const definition of DEMO_THEORIES) {
      parseTheory(definition) // the demo must itself be a valid theory file
      await trx('theories').insert({ group_id: group.id, name: definition.name, definition: JSON.stringify(definition), created_by: owner.id })
    }
    LadderDocumentSchema.parse(DEMO_LADDER.ladder) // the demo ladder must itself be valid
    const ladderTheory = await trx('theories').where({ group_id: group.id, name: DEMO_LADDER.theory }).first('id')
    await trx('scale_ladders').insert({ theory_id: ladderTheory.id, ladder: JSON.stringify(DEMO_LADDER.ladder), updated_by: owner.id })
  })
  if (enqueue) await enqueueDemoRuns(db, enqueue)
  return true
}

async function enqueueDemoRuns(db: Knex, enqueue: (runId: number) => Promise<string | null>) {
  for (const r of DEMO_RUNS) {
    const theory = await db('theories').where({ name: r.theory }).first('id', 'definition', 'version', 'created_by')
    const params = { maxDim: r.maxDim, nf: 'nf' in r ? r.nf : undefined, theory: theory.definition, theoryVersion: theory.version }
    const [run] = await db('runs')
      .insert({ theory_id: theory.id, kind: r.kind, params: JSON.stringify(params), created_by: theory.created_by })
      .returning('id')
    const jobId = await enqueue(run.id)
    await db('runs').where({ id: run.id }).update({ job_id: jobId })
  }
}
