import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { testDb } from '../support/db'
import { messageOf } from '../support/client'
import * as lorentzWords from '../../migrations/20261203_020_lorentz_kind_words'
import * as classOrders from '../../migrations/20261203_021_class_orders'

// Migrations that rewrite stored data, on the real test database. Each case runs inside a
// transaction that is rolled back, so the rows of other tests are left as they were.
let world: World
beforeAll(async () => {
  world = await buildWorld()
})

const OLD = {
  name: 'Old letters',
  frame: 'relativistic',
  groups: [{ name: 'U', type: 'U1', gauge: true }],
  fields: [
    { name: 'h', lorentz: 'S', charges: { U: '1' } },
    { name: 'l', lorentz: 'L', charges: { U: '1' } },
    { name: 'r', lorentz: 'R', charges: { U: '1' } },
    { name: 'A', lorentz: 'F', gaugeOf: 'U' },
  ],
}
const NEW_WORDS = ['scalar', 'left-weyl', 'right-weyl', 'field-strength']

class Rollback extends Error {}

/** Run `body` in a transaction that is always rolled back. */
async function inRolledBackTransaction(body: (trx: import('knex').Knex.Transaction) => Promise<void>) {
  await testDb()
    .transaction(async (trx) => {
      await body(trx)
      throw new Rollback()
    })
    .catch((e) => {
      if (!(e instanceof Rollback)) throw e
    })
}

const lorentzOf = (file: { fields: { lorentz: string }[] }) => file.fields.map((f) => f.lorentz)

describe('migration 20261203_020: Lorentz kinds in words', () => {
  it('rewrites stored theories and the theory files frozen into runs, and down restores the letters', async () => {
    await inRolledBackTransaction(async (trx) => {
      await trx('theories')
        .where({ id: world.theoryId })
        .update({ definition: JSON.stringify(OLD) })
      const [run] = await trx('runs')
        .insert({ theory_id: world.theoryId, kind: 'count', status: 'done', params: JSON.stringify({ theory: OLD, maxDim: 6 }) })
        .returning('id')
      const heavy = { name: 'No fields array', frame: 'heavy', groups: [] }
      const [other] = await trx('runs')
        .insert({ theory_id: world.theoryId, kind: 'count', status: 'done', params: JSON.stringify({ theory: heavy, maxDim: 6 }) })
        .returning('id')
      await lorentzWords.up(trx)
      const theory = await trx('theories').where({ id: world.theoryId }).first('definition')
      expect(lorentzOf(theory.definition)).toEqual(NEW_WORDS)
      expect(theory.definition.fields[3]).toEqual({ name: 'A', lorentz: 'field-strength', gaugeOf: 'U' })
      const params = (await trx('runs').where({ id: run.id }).first('params')).params
      expect(lorentzOf(params.theory)).toEqual(NEW_WORDS)
      expect(params.maxDim).toBe(6)
      expect((await trx('runs').where({ id: other.id }).first('params')).params.theory).toEqual(heavy)
      await lorentzWords.up(trx) // a second pass changes nothing
      expect(lorentzOf((await trx('theories').where({ id: world.theoryId }).first('definition')).definition)).toEqual(NEW_WORDS)
      await lorentzWords.down(trx)
      expect((await trx('theories').where({ id: world.theoryId }).first('definition')).definition).toEqual(OLD)
      expect((await trx('runs').where({ id: run.id }).first('params')).params.theory).toEqual(OLD)
    })
  })

  it('an upload with the old letters is refused with the new words, and nothing is written', async () => {
    const before = await testDb()('theories').count('* as n')
    const res = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition: OLD })
    expect(res.status).toBe(400)
    const message = messageOf(res)
    expect(message).toContain('Field 1 "h", Lorentz kind: "S" is the old one-letter spelling')
    expect(message).toContain('"S" is the old one-letter spelling; write "scalar" (the other Lorentz kinds are "left-weyl", "right-weyl", "field-strength")')
    expect(message).toContain('"F" is the old one-letter spelling; write "field-strength"')
    expect(await testDb()('theories').count('* as n')).toEqual(before)
  })
})

describe('migration 20261203_021: every stored class carries its order', () => {
  it('adds order = dimension − 4 where it is missing and leaves other classes alone', async () => {
    await inRolledBackTransaction(async (trx) => {
      const classes = [
        { dimension: 6, key: 'H^3 H*^3', rank: 1 },
        { order: 2, dimension: null, key: 'psi* psi (1/m^2)', rank: 3 },
        { order: 4, dimension: 8, key: 'F_L^4', rank: 1 },
      ]
      const [basis] = await trx('bases')
        .insert({ theory_id: world.theoryId, theory_version: 1, max_order: 4, classes: JSON.stringify(classes) })
        .returning('id')
      await classOrders.up(trx)
      const stored = (await trx('bases').where({ id: basis.id }).first('classes')).classes
      expect(stored).toEqual([{ ...classes[0], order: 2 }, classes[1], classes[2]])
    })
  })
})
