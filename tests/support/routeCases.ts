import type { GroupRole } from '../../shared/types/roles'
import { addMember, SMALL_THEORY, type World, type Actor } from './fixtures'
import { signedUpClient } from './client'
import { testDb } from './db'

export type Access =
  | { kind: 'public', why: string }
  | { kind: 'signedIn' }
  | { kind: 'admin' }
  | { kind: 'group', min: GroupRole }

export interface Prepared { path: string, body?: unknown }
export interface RouteCase {
  access: Access
  /** A fresh, valid request for `actor` (a new target each time, so success can be checked). */
  prepare: (w: World, actor: Actor) => Promise<Prepared>
  /** Body has required fields: `{}` must be rejected. */
  requiresBody?: boolean
}

let n = 0
const fresh = () => `${Date.now().toString(36)}${n++}`

async function newTheory(w: World) {
  const r = await w.owner.client.post(`/api/groups/${w.slug}/theories`, { definition: { ...SMALL_THEORY, name: `T${fresh()}` } })
  return r.body.theory as { id: number, version: number }
}
async function noteBy(w: World, author: Actor) {
  const r = await author.client.post(`/api/theories/${w.theoryId}/annotations`, { body: 'a note' })
  if (r.status !== 201) throw new Error(`note failed ${JSON.stringify(r.body)}`)
  return r.body.annotation.id as number
}

/**
 * Every mutating route with its access rule and a valid request. The role test fails when a
 * route file exists without an entry here, so no route escapes the exhaustive checks.
 */
export const ROUTE_CASES: Record<string, RouteCase> = {
  'POST /api/auth/signup': { access: { kind: 'public', why: 'creating an account' }, prepare: async () => ({ path: '/api/auth/signup', body: { email: `new-${fresh()}@example.test`, password: 'long enough password', displayName: 'New' } }), requiresBody: true },
  'POST /api/auth/signin': { access: { kind: 'public', why: 'signing in' }, prepare: async () => ({ path: '/api/auth/signin', body: { email: 'nobody@example.test', password: 'x' } }), requiresBody: true },
  'POST /api/auth/signout': { access: { kind: 'public', why: 'clears only the caller\'s own cookie' }, prepare: async () => ({ path: '/api/auth/signout' }) },
  'POST /api/auth/reset-request': { access: { kind: 'public', why: 'forgotten passwords' }, prepare: async () => ({ path: '/api/auth/reset-request', body: { email: 'nobody@example.test' } }), requiresBody: true },
  'POST /api/auth/reset': { access: { kind: 'public', why: 'guarded by the e-mailed token' }, prepare: async () => ({ path: '/api/auth/reset', body: { token: 'x'.repeat(43), password: 'long enough password' } }), requiresBody: true },
  'POST /api/groups': { access: { kind: 'signedIn' }, prepare: async () => ({ path: '/api/groups', body: { slug: `g-${fresh()}`, name: 'A group' } }), requiresBody: true },
  'POST /api/groups/[slug]/members': {
    access: { kind: 'group', min: 'owner' },
    requiresBody: true,
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members`, body: { email: (await addMemberLater()).email, role: 'viewer' } }),
  },
  'PATCH /api/groups/[slug]/members/[userId]': {
    access: { kind: 'group', min: 'owner' },
    requiresBody: true,
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members/${(await addMember(w, 'viewer')).id}`, body: { role: 'commenter' } }),
  },
  'DELETE /api/groups/[slug]/members/[userId]': {
    access: { kind: 'group', min: 'owner' },
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members/${(await addMember(w, 'viewer')).id}` }),
  },
  'POST /api/groups/[slug]/theories': {
    access: { kind: 'group', min: 'editor' },
    requiresBody: true,
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/theories`, body: { definition: { ...SMALL_THEORY, name: `T${fresh()}` } } }),
  },
  'PATCH /api/theories/[id]': {
    access: { kind: 'group', min: 'editor' },
    requiresBody: true,
    prepare: async (w) => {
      const t = await newTheory(w)
      return { path: `/api/theories/${t.id}`, body: { definition: { ...SMALL_THEORY, name: `T${fresh()}` }, version: t.version } }
    },
  },
  'DELETE /api/theories/[id]': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/theories/${(await newTheory(w)).id}` }) },
  'POST /api/theories/[id]/annotations': { access: { kind: 'group', min: 'commenter' }, requiresBody: true, prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/annotations`, body: { body: 'looks right' } }) },
  // Notes: the author edits/deletes their own; the role floor is commenter (checked here with own notes).
  'PATCH /api/annotations/[id]': {
    access: { kind: 'group', min: 'commenter' },
    requiresBody: true,
    prepare: async (w, actor) => ({ path: `/api/annotations/${await noteBy(w, canWrite(w, actor))}`, body: { body: 'edited' } }),
  },
  'DELETE /api/annotations/[id]': {
    access: { kind: 'group', min: 'commenter' },
    prepare: async (w, actor) => ({ path: `/api/annotations/${await noteBy(w, canWrite(w, actor))}` }),
  },
  'POST /api/count': { access: { kind: 'signedIn' }, requiresBody: true, prepare: async () => ({ path: '/api/count', body: { theory: SMALL_THEORY, maxDim: 6 } }) },
  'POST /api/theories/[id]/runs': { access: { kind: 'group', min: 'editor' }, requiresBody: true, prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/runs`, body: { kind: 'count', maxDim: 5 } }) },
  // A queued run that no worker will take (inserted without a queue job), so that it is still cancellable.
  'POST /api/runs/[id]/cancel': { access: { kind: 'group', min: 'editor' }, prepare: async (w) => ({ path: `/api/runs/${await idleRun(w)}/cancel` }) },
  'PATCH /api/admin/users/[id]': { access: { kind: 'admin' }, requiresBody: true, prepare: async (w) => ({ path: `/api/admin/users/${w.stranger.id}`, body: { siteRole: 'member' } }) },
}

async function idleRun(w: World): Promise<number> {
  const [row] = await testDb()('runs').insert({ theory_id: w.theoryId, kind: 'count', params: JSON.stringify({ maxDim: 5, theory: SMALL_THEORY, theoryVersion: 1 }) }).returning('id')
  return row.id
}

// A note written by the actor when they may write notes, else by the commenter: so that a
// denied actor is denied because of their role, not because the note is someone else's.
function canWrite(w: World, actor: Actor): Actor {
  const roles = Object.entries(w.byRole).filter(([, a]) => a.id === actor.id).map(([r]) => r)
  return roles.some((r) => r !== 'viewer') ? actor : w.byRole.commenter
}

// Members route needs an account that is not yet in the group: sign one up on demand.
async function addMemberLater() {
  return signedUpClient('candidate')
}
