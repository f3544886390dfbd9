import { ApiClient, signedUpClient, mailedToken } from './client'
import { makeAdmin } from './db'
import type { GroupRole } from '../../shared/types/roles'

export const SMALL_THEORY = {
  name: 'Two scalars',
  frame: 'relativistic',
  groups: [{ name: 'U', type: 'U1', gauge: true }],
  fields: [
    { name: 'phi', lorentz: 'scalar', charges: { U: '1' } },
    { name: 'A', lorentz: 'field-strength', gaugeOf: 'U' },
  ],
}

/** U(1) gauge theory with a charged Dirac fermion (two Weyl fields) and a real scalar: integrate-out cases. */
export const DIRAC_AND_SCALAR = {
  name: 'Heavy electron and a scalar',
  frame: 'relativistic',
  groups: [{ name: 'QED', type: 'U1', gauge: true }],
  fields: [
    { name: 'eL', lorentz: 'left-weyl', charges: { QED: '-1' } },
    { name: 'eR', lorentz: 'right-weyl', charges: { QED: '-1' } },
    { name: 'S', lorentz: 'scalar', real: true },
    { name: 'A', lorentz: 'field-strength', gaugeOf: 'QED' },
  ],
}

export interface Actor {
  client: ApiClient
  id: number
  email: string
}
export interface World {
  /** The editor's client (runs and edits). */
  editorClient: () => ApiClient
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
  for (const role of ['viewer', 'commenter', 'editor'] as const) byRole[role] = await joined(owner, slug, await signedUpClient(role), role)
  const stranger = await signedUpClient('stranger')
  const admin = await signedUpClient('admin')
  await makeAdmin(admin.id)
  const t = await owner.client.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: `T-${slug}` } })
  if (t.status !== 201) throw new Error(`theory create failed ${JSON.stringify(t.body)}`)
  return { editorClient: () => byRole.editor.client, slug, groupId: g.body.group.id, owner, byRole, stranger, admin, anonymous: new ApiClient(), theoryId: t.body.theory.id }
}

/** The owner invites the actor with a role and the actor accepts the mailed invitation. */
async function joined(owner: Actor, slug: string, actor: Actor, role: GroupRole): Promise<Actor> {
  const r = await owner.client.post(`/api/groups/${slug}/members`, { email: actor.email, role })
  if (r.status !== 201) throw new Error(`inviting ${role} failed ${JSON.stringify(r.body)}`)
  const a = await actor.client.post('/api/invitations/accept', { token: await mailedToken(actor.email, 'join') })
  if (a.status !== 200) throw new Error(`accepting as ${role} failed ${JSON.stringify(a.body)}`)
  return actor
}

/** Add a fresh account to the group with a role (a target for member routes). */
export async function addMember(world: World, role: GroupRole): Promise<Actor> {
  return joined(world.owner, world.slug, await signedUpClient(`extra-${role}`), role)
}

/**
 * A stored basis for the world's theory, computed by the real engine in this process and
 * written by the worker's own persistence code (fingerprints included). Operators by role:
 * `derivative` (kept, D^2 phi^2 phi*^2), `sextic` (kept, phi^3 phi*^3), `photon` (kept,
 * phi phi* A_L^2) and `alternative` (set aside, a redundant D^2 phi^2 phi*^2 candidate).
 */
export async function addBasis(world: World) {
  const { testDb } = await import('./db')
  const { buildBasis } = await import('../../server/engine/basis/buildBasis')
  const { persistRunResult } = await import('../../server/worker/persistRun')
  const db = testDb()
  const params = { maxDim: 6, theory: SMALL_THEORY, theoryVersion: 1 }
  const [run] = await db('runs')
    .insert({ theory_id: world.theoryId, kind: 'basis', params: JSON.stringify(params), status: 'running' })
    .returning('*')
  const report = buildBasis(SMALL_THEORY as never, { maxDim: 6, minDim: 6 })
  await persistRunResult(db, { ...run, params }, report)
  const basis = await db('bases').where({ run_id: run.id }).first('id')
  const ops = await db('operators').where({ basis_id: basis.id }).orderBy('id').select('id', 'class_key', 'column')
  const pick = (key: string, column: string) => ops.find((o) => o.class_key === key && o.column === column)!.id as number
  return {
    basisId: basis.id as number,
    operatorIds: {
      derivative: pick('D^2 phi^2 phi*^2', 'kept'),
      sextic: pick('phi^3 phi*^3', 'kept'),
      photon: pick('phi phi* A_L^2', 'kept'),
      alternative: pick('D^2 phi^2 phi*^2', 'set_aside'),
    },
  }
}
