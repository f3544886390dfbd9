import { ApiClient, signedUpClient } from './client'
import { makeAdmin } from './db'
import type { GroupRole } from '../../shared/types/roles'

export const SMALL_THEORY = {
  name: 'Two scalars',
  frame: 'relativistic',
  groups: [{ name: 'U', type: 'U1', gauge: true }],
  fields: [{ name: 'phi', lorentz: 'S', charges: { U: '1' } }, { name: 'A', lorentz: 'F', gaugeOf: 'U' }],
}

export interface Actor { client: ApiClient, id: number, email: string }
export interface World {
  slug: string
  groupId: number
  owner: Actor
  byRole: Record<GroupRole, Actor>
  stranger: Actor
  admin: Actor
  anonymous: ApiClient
  theoryId: number
}

let counter = 0
/** A group with one account per role, a stranger, an admin, and one theory. */
export async function buildWorld(): Promise<World> {
  const owner = await signedUpClient('owner')
  const slug = `grp-${Date.now().toString(36)}-${counter++}`
  const g = await owner.client.post('/api/groups', { slug, name: `Group ${slug}` })
  if (g.status !== 201) throw new Error(`group create failed ${JSON.stringify(g.body)}`)
  const byRole = { owner } as Record<GroupRole, Actor>
  for (const role of ['viewer', 'commenter', 'editor'] as const) {
    const actor = await signedUpClient(role)
    const r = await owner.client.post(`/api/groups/${slug}/members`, { email: actor.email, role })
    if (r.status !== 201) throw new Error(`adding ${role} failed ${JSON.stringify(r.body)}`)
    byRole[role] = actor
  }
  const stranger = await signedUpClient('stranger')
  const admin = await signedUpClient('admin')
  await makeAdmin(admin.id)
  const t = await owner.client.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: `T-${slug}` } })
  if (t.status !== 201) throw new Error(`theory create failed ${JSON.stringify(t.body)}`)
  return { slug, groupId: g.body.group.id, owner, byRole, stranger, admin, anonymous: new ApiClient(), theoryId: t.body.theory.id }
}

/** Add a fresh account to the group with a role (a target for member routes). */
export async function addMember(world: World, role: GroupRole): Promise<Actor> {
  const actor = await signedUpClient(`extra-${role}`)
  const r = await world.owner.client.post(`/api/groups/${world.slug}/members`, { email: actor.email, role })
  if (r.status !== 201) throw new Error(`adding member failed ${JSON.stringify(r.body)}`)
  return actor
}

/** A stored basis for the world's theory (rows written directly: a fixture, not a computation). */
export async function addBasis(world: World) {
  const { testDb } = await import('./db')
  const db = testDb()
  const classes = [{ dimension: 6, key: 'phi^3 phi*^3', rank: 1, hilbert: 1, tallyOk: true }, { dimension: 6, key: 'D^2 phi^2 phi*^2', rank: 2, hilbert: 2, tallyOk: true }]
  const [basis] = await db('bases').insert({ theory_id: world.theoryId, theory_version: 1, max_order: 2, classes: JSON.stringify(classes) }).returning('id')
  const ops = [
    { class_key: 'phi^3 phi*^3', column: 'kept', position: 0, text: 'phi^3 phi*^3', latex: '|\\phi|^6' },
    { class_key: 'D^2 phi^2 phi*^2', column: 'kept', position: 1, text: 'A', latex: 'O_A' },
    { class_key: 'D^2 phi^2 phi*^2', column: 'kept', position: 2, text: 'B', latex: 'O_B' },
    { class_key: 'D^2 phi^2 phi*^2', column: 'set_aside', position: 0, text: 'C', latex: 'O_C' },
  ]
  const rows = await db('operators').insert(ops.map((o) => ({ ...o, basis_id: basis.id, order: 2, structure: '{}', hermitian: true, real_parameters: 1 }))).returning(['id', 'text'])
  return { basisId: basis.id as number, operatorIds: Object.fromEntries(rows.map((r) => [r.text, r.id])) as Record<string, number> }
}
