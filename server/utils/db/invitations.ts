import type { Knex } from 'knex'
import { fail } from '../http/apiHandler'
import { hashToken } from '../tokens'

export interface InvitationRow {
  id: number
  group_id: number
  email: string
  role: string
  expires_at: Date
  accepted_at: Date | null
}

/** The live invitation a token opens, locked for this transaction; 400 when dead, 403 for another address. */
export async function openInvitation(trx: Knex.Transaction, token: string, email: string): Promise<InvitationRow> {
  const inv = await trx('invitations')
    .where({ token_hash: hashToken(token) })
    .forUpdate()
    .first()
  if (!inv || inv.accepted_at || new Date(inv.expires_at) < new Date()) fail(400, 'This invitation is invalid, used or expired; ask the group owner for a new one')
  if (inv.email !== email.toLowerCase()) fail(403, `This invitation was sent to ${inv.email}; sign in with that address to accept it`)
  return inv
}

/** Spend an invitation token: the user joins its group with its role (inside the caller's transaction). */
export async function acceptInvitation(trx: Knex.Transaction, token: string, userId: number, email: string) {
  const inv = await openInvitation(trx, token, email)
  await trx('invitations').where({ id: inv.id }).update({ accepted_at: trx.fn.now() })
  await trx('memberships').insert({ group_id: inv.group_id, user_id: userId, role: inv.role }).onConflict(['group_id', 'user_id']).ignore()
  return inv.group_id
}

/** Whether an address belongs to a member of the group (an owner sees the members' addresses anyway). */
export async function isMemberAddress(trx: Knex.Transaction, groupId: number, email: string): Promise<boolean> {
  const row = await trx('memberships as m').join('users as u', 'u.id', 'm.user_id').where({ 'm.group_id': groupId, 'u.email': email }).first('u.id')
  return row !== undefined
}
