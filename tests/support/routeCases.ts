import { GROUP_ROLES, type GroupRole } from '../../shared/types/roles'
import { createHash, randomBytes } from 'node:crypto'
import { addMember, addBasis, SMALL_THEORY, type World, type Actor } from './fixtures'
import { ApiClient, signedUpClient, mailedToken, TEST_PASSWORD } from './client'
import { IMPORT_MAX_BYTES } from '../../shared/schemas/importChoice'
import { testDb } from './db'

export type Access = { kind: 'public'; why: string } | { kind: 'signedIn' } | { kind: 'admin' } | { kind: 'group'; min: GroupRole }

export interface Prepared {
  path: string
  body?: unknown
}
export interface RouteCase {
  access: Access
  /** A fresh, valid request for `actor` (a new target each time, so success can be checked). */
  prepare: (w: World, actor: Actor) => Promise<Prepared>
  /** The request has a JSON body: 'required' fields (so `{}` is rejected) or only 'optional' ones. */
  body?: 'required' | 'optional'
  /** A body limit other than the default 512 KiB. */
  maxBodyBytes?: number
}

let n = 0
const fresh = () => `${Date.now().toString(36)}${n++}`

async function newTheory(w: World) {
  const r = await w.owner.client.post(`/api/groups/${w.slug}/theories`, { definition: { ...SMALL_THEORY, name: `T${fresh()}` } })
  return r.body.theory as { id: number; version: number }
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
  'POST /api/auth/signup': {
    access: { kind: 'public', why: 'creating an account' },
    prepare: async () => ({ path: '/api/auth/signup', body: { email: `new-${fresh()}@example.test`, password: 'long enough password', displayName: 'New' } }),
    body: 'required',
  },
  'POST /api/auth/signup-confirm': {
    access: { kind: 'public', why: 'guarded by the e-mailed token' },
    prepare: async () => ({ path: '/api/auth/signup-confirm', body: { token: await pendingSignUp() } }),
    body: 'required',
  },
  'POST /api/auth/signin': {
    access: { kind: 'public', why: 'signing in' },
    prepare: async () => ({ path: '/api/auth/signin', body: { email: 'nobody@example.test', password: 'x' } }),
    body: 'required',
  },
  'POST /api/auth/signout': { access: { kind: 'public', why: "clears only the caller's own cookie" }, prepare: async () => ({ path: '/api/auth/signout' }) },
  'POST /api/auth/reset-request': {
    access: { kind: 'public', why: 'forgotten passwords' },
    prepare: async () => ({ path: '/api/auth/reset-request', body: { email: 'nobody@example.test' } }),
    body: 'required',
  },
  // The password stays the same, so the actor signs in as before; the caller keeps a fresh cookie.
  'POST /api/auth/password': { access: { kind: 'signedIn' }, prepare: async () => ({ path: '/api/auth/password', body: { current: TEST_PASSWORD, password: TEST_PASSWORD } }), body: 'required' },
  'POST /api/auth/end-other-sessions': { access: { kind: 'signedIn' }, prepare: async () => ({ path: '/api/auth/end-other-sessions' }) },
  'POST /api/auth/reset': {
    access: { kind: 'public', why: 'guarded by the e-mailed token' },
    prepare: async () => ({ path: '/api/auth/reset', body: { token: 'x'.repeat(43), password: 'long enough password' } }),
    body: 'required',
  },
  'POST /api/groups': { access: { kind: 'signedIn' }, prepare: async () => ({ path: '/api/groups', body: { slug: `g-${fresh()}`, name: 'A group' } }), body: 'required' },
  'POST /api/groups/[slug]/members': {
    access: { kind: 'group', min: 'owner' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members`, body: { email: (await addMemberLater()).email, role: 'viewer' } }),
  },
  'PATCH /api/groups/[slug]/members/[userId]': {
    access: { kind: 'group', min: 'owner' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members/${(await addMember(w, 'viewer')).id}`, body: { role: 'commenter' } }),
  },
  'DELETE /api/groups/[slug]/members/[userId]': {
    access: { kind: 'group', min: 'owner' },
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/members/${(await addMember(w, 'viewer')).id}` }),
  },
  'POST /api/groups/[slug]/theories': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/theories`, body: { definition: { ...SMALL_THEORY, name: `T${fresh()}` } } }),
  },
  'PATCH /api/theories/[id]': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => {
      const t = await newTheory(w)
      return { path: `/api/theories/${t.id}`, body: { definition: { ...SMALL_THEORY, name: `T${fresh()}` }, version: t.version } }
    },
  },
  'DELETE /api/theories/[id]': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/theories/${(await newTheory(w)).id}` }) },
  'POST /api/theories/[id]/annotations': {
    access: { kind: 'group', min: 'commenter' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/annotations`, body: { body: 'looks right' } }),
  },
  // Notes: the author edits/deletes their own; the role floor is commenter (checked here with own notes).
  'PATCH /api/annotations/[id]': {
    access: { kind: 'group', min: 'commenter' },
    body: 'required',
    prepare: async (w, actor) => ({ path: `/api/annotations/${await noteBy(w, canWrite(w, actor))}`, body: { body: 'edited' } }),
  },
  'DELETE /api/annotations/[id]': {
    access: { kind: 'group', min: 'commenter' },
    prepare: async (w, actor) => ({ path: `/api/annotations/${await noteBy(w, canWrite(w, actor))}` }),
  },
  'POST /api/count': { access: { kind: 'signedIn' }, body: 'required', prepare: async () => ({ path: '/api/count', body: { theory: SMALL_THEORY, maxDim: 6 } }) },
  'POST /api/theory-check': { access: { kind: 'signedIn' }, body: 'required', prepare: async () => ({ path: '/api/theory-check', body: { theory: SMALL_THEORY } }) },
  'POST /api/theories/[id]/runs': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/runs`, body: { kind: 'count', maxDim: 5 } }),
  },
  // A queued run that no worker will take (inserted without a queue job), so that it is still cancellable.
  'POST /api/runs/[id]/cancel': { access: { kind: 'group', min: 'editor' }, prepare: async (w) => ({ path: `/api/runs/${await idleRun(w)}/cancel` }) },
  'POST /api/operators/[id]/move': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => {
      const op = await testDb()('operators')
        .where({ id: (await basisOf(w)).operatorIds.sextic })
        .first('id', 'version')
      return { path: `/api/operators/${op.id}/move`, body: { column: 'set_aside', position: 0, version: op.version } }
    },
  },
  'POST /api/bases/[id]/rewrite': {
    access: { kind: 'group', min: 'viewer' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/bases/${(await basisOf(w)).basisId}/rewrite`, body: { classKey: 'D^2 phi^2 phi*^2', text: '<13>[13]' } }),
  },
  'POST /api/bases/[id]/check-list': {
    access: { kind: 'group', min: 'viewer' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/bases/${(await basisOf(w)).basisId}/check-list`, body: { order: 2, operators: '(\\phi^\\dagger\\phi)^3' } }),
  },
  'POST /api/operators/[id]/tags': {
    access: { kind: 'group', min: 'commenter' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/operators/${(await basisOf(w)).operatorIds.photon}/tags`, body: { kind: 'custom', label: `tag ${fresh()}` } }),
  },
  // Tags, like notes, are deleted by their author (or an owner): the tag is the actor's own when they may write.
  'DELETE /api/tags/[id]': {
    access: { kind: 'group', min: 'commenter' },
    prepare: async (w, actor) => {
      const [tag] = await testDb()('tags')
        .insert({ operator_id: (await basisOf(w)).operatorIds.photon, kind: 'custom', label: `t${fresh()}`, created_by: canWrite(w, actor).id })
        .returning('id')
      return { path: `/api/tags/${tag.id}` }
    },
  },
  'POST /api/bases/[id]/import': {
    access: { kind: 'group', min: 'editor' },
    maxBodyBytes: IMPORT_MAX_BYTES,
    body: 'required',
    prepare: async (w) => ({
      path: `/api/bases/${(await basisOf(w)).basisId}/import`,
      body: { format: 'scalewright-basis', formatVersion: 1, orders: [{ order: 2, classes: [{ key: 'phi phi* A_L^2', operators: [{ text: '<34>^2', column: 'kept' }] }] }] },
    }),
  },
  'POST /api/theories/[id]/share-links': {
    access: { kind: 'group', min: 'owner' },
    body: 'optional',
    prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/share-links`, body: { expiresInDays: 7 } }),
  },
  'DELETE /api/share-links/[id]': {
    access: { kind: 'group', min: 'owner' },
    prepare: async (w) => {
      const [link] = await testDb()('share_links')
        .insert({ theory_id: w.theoryId, token_hash: createHash('sha256').update(fresh()).digest('hex') })
        .returning('id')
      return { path: `/api/share-links/${link.id}` }
    },
  },
  'POST /api/groups/[slug]/invitations': {
    access: { kind: 'group', min: 'owner' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/groups/${w.slug}/invitations`, body: { email: `invitee-${fresh()}@example.test`, role: 'viewer' } }),
  },
  'DELETE /api/invitations/[id]': {
    access: { kind: 'group', min: 'owner' },
    prepare: async (w) => ({ path: `/api/invitations/${(await invitation(w.groupId, `x-${fresh()}@example.test`)).id}` }),
  },
  // Accepting joins the group the invitation names: a throwaway group, so the world's stranger stays a stranger.
  'POST /api/invitations/accept': {
    access: { kind: 'signedIn' },
    body: 'required',
    prepare: async (_w, actor) => {
      const [g] = await testDb()('groups')
        .insert({ slug: `inv-${fresh()}`, name: 'Invitation target' })
        .returning('id')
      return { path: '/api/invitations/accept', body: { token: (await invitation(g.id, actor.email)).token } }
    },
  },
  'POST /api/invitations/lookup': {
    access: { kind: 'public', why: 'reads what an invitation offers; the token is the secret' },
    body: 'required',
    prepare: async (w) => ({ path: '/api/invitations/lookup', body: { token: (await invitation(w.groupId, `y-${fresh()}@example.test`)).token } }),
  },
  // Scales and towers: a fresh theory each time, so a new ladder (version 0) or a child name never clashes.
  'PUT /api/theories/[id]/scales': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/theories/${(await newTheory(w)).id}/scales`, body: { ladder: SMALL_LADDER, version: 0 } }),
  },
  'POST /api/bases/[id]/set-aside-below': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => {
      await testDb()('scale_ladders')
        .insert({ theory_id: w.theoryId, ladder: JSON.stringify(SMALL_LADDER) })
        .onConflict('theory_id')
        .ignore()
      return { path: `/api/bases/${(await addBasis(w)).basisId}/set-aside-below`, body: { target: 1e-3 } }
    },
  },
  'POST /api/theories/[id]/integrate-out': {
    access: { kind: 'group', min: 'editor' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/theories/${(await newTheory(w)).id}/integrate-out`, body: { fields: ['phi'], scale: { name: 'M', value: 1, unit: 'TeV' } } }),
  },
  'POST /api/running/qcd': {
    access: { kind: 'signedIn' },
    body: 'required',
    prepare: async () => ({ path: '/api/running/qcd', body: { alphaS: 0.118, muFrom: 91.188, muTo: 10, loops: 2, thresholds: [{ name: 'b', mass: 4.183, kind: 'msbar' }] } }),
  },
  // Reads only (nothing stored), so every group role may run the theory's own gauge couplings.
  'POST /api/theories/[id]/gauge-running': {
    access: { kind: 'group', min: 'viewer' },
    body: 'required',
    prepare: async (w) => ({ path: `/api/theories/${w.theoryId}/gauge-running`, body: { loops: 1, muFromGeV: 1, alpha: { U: 0.01 }, plotFromGeV: 1, plotToGeV: 100 } }),
  },
  'POST /api/running/qed': { access: { kind: 'signedIn' }, body: 'required', prepare: async () => ({ path: '/api/running/qed', body: { muTo: 91.188, quarks: false, deltaAlphaHad5: 0.02766 } }) },
  // Deletion marks a row; undo (restore) clears the mark. Each case deletes or restores a fresh target.
  'DELETE /api/bases/[id]': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/bases/${(await addBasis(w)).basisId}` }) },
  'POST /api/bases/[id]/restore': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/bases/${await deletedRow('bases', (await addBasis(w)).basisId)}/restore` }) },
  'POST /api/theories/[id]/restore': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/theories/${await deletedRow('theories', (await newTheory(w)).id)}/restore` }) },
  'DELETE /api/groups/[slug]': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/groups/${await groupLike(w, false)}` }) },
  'POST /api/groups/[slug]/restore': { access: { kind: 'group', min: 'owner' }, prepare: async (w) => ({ path: `/api/groups/${await groupLike(w, true)}/restore` }) },
  'POST /api/annotations/[id]/restore': {
    access: { kind: 'group', min: 'commenter' },
    prepare: async (w, actor) => ({ path: `/api/annotations/${await deletedRow('annotations', await noteBy(w, canWrite(w, actor)))}/restore` }),
  },
  'POST /api/tags/[id]/restore': {
    access: { kind: 'group', min: 'commenter' },
    prepare: async (w) => {
      const [tag] = await testDb()('tags')
        .insert({ operator_id: (await basisOf(w)).operatorIds.photon, kind: 'custom', label: `t${fresh()}`, deleted_at: new Date() })
        .returning('id')
      return { path: `/api/tags/${tag.id}/restore` }
    },
  },
  'POST /api/share-links/[id]/restore': {
    access: { kind: 'group', min: 'owner' },
    prepare: async (w) => {
      const [link] = await testDb()('share_links')
        .insert({ theory_id: w.theoryId, token_hash: createHash('sha256').update(fresh()).digest('hex'), revoked_at: new Date() })
        .returning('id')
      return { path: `/api/share-links/${link.id}/restore` }
    },
  },
  'PATCH /api/admin/users/[id]': { access: { kind: 'admin' }, body: 'required', prepare: async (w) => ({ path: `/api/admin/users/${w.stranger.id}`, body: { siteRole: 'member' } }) },
}

/** A ladder with ε = E/M = 10 GeV / 1 TeV = 1/100: order 2 (the operators of addBasis) is estimated at 1e-4. */
export const SMALL_LADDER = {
  scales: [
    { name: 'E', value: '10', unit: 'GeV' },
    { name: 'M', value: '1', unit: 'TeV' },
  ],
  parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }],
  precisionTarget: 1e-3,
  orders: [0, 1, 2, 3],
}

const bases = new WeakMap<World, ReturnType<typeof addBasis>>()
function basisOf(w: World) {
  if (!bases.has(w)) bases.set(w, addBasis(w))
  return bases.get(w)!
}

/** Mark a row deleted (as its DELETE route would) and return its id: a target for undo. */
async function deletedRow(table: 'bases' | 'theories' | 'annotations', id: number): Promise<number> {
  await testDb()(table).where({ id }).update({ deleted_at: new Date() })
  return id
}

/** A fresh group with the world's accounts in the world's roles (a target that may be deleted). */
async function groupLike(w: World, deleted: boolean): Promise<string> {
  const [g] = await testDb()('groups')
    .insert({ slug: `del-${fresh()}`, name: 'A group to delete', deleted_at: deleted ? new Date() : null })
    .returning(['id', 'slug'])
  await testDb()('memberships').insert(GROUP_ROLES.map((role) => ({ group_id: g.id, user_id: w.byRole[role].id, role })))
  return g.slug
}

async function invitation(groupId: number, email: string) {
  const token = randomBytes(32).toString('base64url')
  const [row] = await testDb()('invitations')
    .insert({ group_id: groupId, email, role: 'viewer', token_hash: createHash('sha256').update(token).digest('hex'), expires_at: new Date(Date.now() + 86_400_000) })
    .returning('id')
  return { id: row.id as number, token }
}

async function idleRun(w: World): Promise<number> {
  const [row] = await testDb()('runs')
    .insert({ theory_id: w.theoryId, kind: 'count', params: JSON.stringify({ maxDim: 5, theory: SMALL_THEORY, theoryVersion: 1 }) })
    .returning('id')
  return row.id
}

// A note written by the actor when they may write notes, else by the commenter: so that a
// denied actor is denied because of their role, not because the note is someone else's.
function canWrite(w: World, actor: Actor): Actor {
  const roles = Object.entries(w.byRole)
    .filter(([, a]) => a.id === actor.id)
    .map(([r]) => r)
  return roles.some((r) => r !== 'viewer') ? actor : w.byRole.commenter
}

/** The token of a fresh sign-up request (the link a new address is mailed). */
async function pendingSignUp(): Promise<string> {
  const email = `pending-${fresh()}@example.test`
  const res = await new ApiClient().post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: 'Pending' })
  if (res.status !== 202) throw new Error(`signup failed ${JSON.stringify(res.body)}`)
  return mailedToken(email, 'welcome')
}

// Members route needs an account that is not yet in the group: sign one up on demand.
async function addMemberLater() {
  return signedUpClient('candidate')
}
