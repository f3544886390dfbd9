import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { messageOf } from '../support/client'
import { testDb } from '../support/db'
import { GROUP_ROLES } from '../../shared/types/roles'

let world: World
beforeAll(async () => {
  world = await buildWorld()
  // A second theory and a child theory, so that order and parentId are exercised.
  const t = await testDb()('theories').where({ id: world.theoryId }).first()
  await testDb()('theories').insert({ group_id: world.groupId, name: 'A first by name', definition: t.definition, parent_id: world.theoryId })
})

// The group page is read in one query (members and theories aggregated as JSON); it must
// answer exactly what the separate reads of the same rows give.
describe('the group page read', () => {
  it('gives every member the group, their role, the members and the theories', async () => {
    const db = testDb()
    const members = await db('memberships as m')
      .join('users as u', 'u.id', 'm.user_id')
      .where('m.group_id', world.groupId)
      .orderBy('u.display_name')
      .select('u.id', 'u.email', 'u.display_name as displayName', 'm.role')
    const theories = (await db('theories').where({ group_id: world.groupId }).orderBy('name').select('id', 'name', 'version', 'parent_id as parentId', 'updated_at as updatedAt')).map((t) => ({
      ...t,
      updatedAt: t.updatedAt.toISOString(),
    }))
    expect(theories.map((t) => t.name)[0]).toBe('A first by name')
    for (const role of GROUP_ROLES) {
      const res = await world.byRole[role].client.get(`/api/groups/${world.slug}`)
      expect(res.status).toBe(200)
      expect(res.body).toEqual({
        group: await db('groups').where({ id: world.groupId }).first('id', 'slug', 'name', 'description'),
        role,
        members,
        theories,
      })
    }
    expect((await world.owner.client.get(`/api/groups/${world.slug.toUpperCase()}`)).body.group.id).toBe(world.groupId)
  })

  it('says why it refuses: no such group, signed out, not a member', async () => {
    const missing = await world.owner.client.get('/api/groups/no-such-group')
    expect(missing.status).toBe(404)
    expect(messageOf(missing)).toBe('No group with short name "no-such-group"')
    const out = await world.anonymous.get(`/api/groups/${world.slug}`)
    expect(out.status).toBe(401)
    expect(messageOf(out)).toBe('Sign in to continue')
    const stranger = await world.stranger.client.get(`/api/groups/${world.slug}`)
    expect(stranger.status).toBe(403)
    expect(messageOf(stranger)).toBe('You are not a member of this group')
    expect(stranger.body.members).toBeUndefined()
  })
})
