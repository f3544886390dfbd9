import { useDb } from './connection'
import { fail } from '../http/apiHandler'
import type { GroupRole } from '../../../shared/types/roles'

export interface GroupRow {
  id: number
  slug: string
  name: string
  description: string
  created_at: Date
  deleted_at?: Date | null
}

/** A group that is not deleted; a deleted one only with `deleted` (for undo). */
export async function groupBySlugOr404(slug: string, opts: { deleted?: boolean } = {}): Promise<GroupRow> {
  const q = useDb()('groups').where({ slug: String(slug).toLowerCase() })
  if (!opts.deleted) q.whereNull('deleted_at')
  const row = await q.first()
  if (!row) fail(404, `No group with short name "${slug}"`)
  return row
}

export function groupsOfUser(userId: number) {
  return useDb()('groups as g')
    .join('memberships as m', 'm.group_id', 'g.id')
    .where('m.user_id', userId)
    .whereNull('g.deleted_at')
    .orderBy('g.name')
    .select('g.id', 'g.slug', 'g.name', 'g.description', 'm.role')
}

export async function createGroupWithOwner(input: { slug: string; name: string; description?: string }, ownerId: number): Promise<GroupRow> {
  return useDb().transaction(async (trx) => {
    const clash = await trx('groups').where({ slug: input.slug }).first('id', 'deleted_at')
    if (clash) fail(409, `The short name "${input.slug}" is taken${clash.deleted_at ? ' by a deleted group (its owners can still restore it)' : ''}; choose another`)
    const [group] = await trx('groups')
      .insert({ slug: input.slug, name: input.name, description: input.description ?? '' })
      .returning('*')
    await trx('memberships').insert({ group_id: group.id, user_id: ownerId, role: 'owner' })
    return group
  })
}

export function membersOf(groupId: number) {
  return useDb()('memberships as m').join('users as u', 'u.id', 'm.user_id').where('m.group_id', groupId).orderBy('u.display_name').select('u.id', 'u.email', 'u.display_name as displayName', 'm.role')
}

/**
 * Change a member's role (or remove them, `newRole` null) as `callerId`, keeping at least one
 * owner. The group's row is locked first (FOR NO KEY UPDATE, which leaves inserts that refer
 * to the group free), so that concurrent changes in one group run one after the other and
 * never deadlock; the caller's own role is read again under the lock, so an owner demoted a
 * moment ago can no longer act as one. Owners change anyone; every member may leave.
 */
export async function changeMembership(groupId: number, callerId: number, targetId: number, newRole: GroupRole | null) {
  await useDb().transaction(async (trx) => {
    await trx('groups').where({ id: groupId }).forNoKeyUpdate().first('id')
    const members: { user_id: number; role: GroupRole }[] = await trx('memberships').where({ group_id: groupId }).select('user_id', 'role')
    const callerRole = members.find((m) => m.user_id === callerId)?.role
    const target = members.find((m) => m.user_id === targetId)
    if (!callerRole) fail(403, 'You are not a member of this group')
    const leaving = newRole === null && callerId === targetId
    if (!leaving && callerRole !== 'owner') {
      fail(403, newRole === null ? 'This needs the owner role in the group; you may only remove yourself' : `This needs the owner role in the group; you are ${callerRole}`)
    }
    if (!target) fail(404, 'That account is not a member of this group')
    const owners = members.filter((m) => m.role === 'owner').length
    if (target.role === 'owner' && newRole !== 'owner' && owners === 1) fail(409, 'A group needs at least one owner; make someone else owner first')
    const row = trx('memberships').where({ group_id: groupId, user_id: targetId })
    await (newRole === null ? row.delete() : row.update({ role: newRole }))
  })
}

/**
 * The group page in one query (a hot read): the group with its members and theories as JSON,
 * in the order and shape of membersOf and theoriesOfGroup. Join the caller with withCaller.
 */
export function groupPageQuery(slug: string) {
  const db = useDb()
  return db('groups as g')
    .where('g.slug', String(slug).toLowerCase())
    .whereNull('g.deleted_at')
    .select(
      'g.id',
      'g.slug',
      'g.name',
      'g.description',
      db.raw(`(select coalesce(json_agg(json_build_object('id', mu.id, 'email', mu.email, 'displayName', mu.display_name, 'role', mm.role) order by mu.display_name), '[]'::json)
      from memberships mm join users mu on mu.id = mm.user_id where mm.group_id = g.id) as members`),
      db.raw(`(select coalesce(json_agg(json_build_object('id', t.id, 'name', t.name, 'version', t.version, 'parentId', t.parent_id,
        'updatedAt', to_char(t.updated_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')) order by t.name), '[]'::json)
      from theories t where t.group_id = g.id and t.deleted_at is null) as theories`),
    )
}
