import type { Knex } from 'knex'
import { fail } from '../http/apiHandler'
import { hashToken } from '../tokens'

/** Spend an invitation token: the user joins its group with its role (inside the caller's transaction). */
export async function acceptInvitation(trx: Knex.Transaction, token: string, userId: number, email: string) {
  const inv = await trx('invitations').where({ token_hash: hashToken(token) }).forUpdate().first()
  if (!inv || inv.accepted_at || new Date(inv.expires_at) < new Date()) fail(400, 'This invitation is invalid, used or expired; ask the group owner for a new one')
  if (inv.email !== email.toLowerCase()) fail(403, `This invitation was sent to ${inv.email}; sign in with that address to accept it`)
  await trx('invitations').where({ id: inv.id }).update({ accepted_at: trx.fn.now() })
  await trx('memberships').insert({ group_id: inv.group_id, user_id: userId, role: inv.role }).onConflict(['group_id', 'user_id']).ignore()
  return inv.group_id as number
}
