import { useDb } from '../db/connection'
import { isMemberAddress } from '../db/invitations'
import { fail } from '../http/apiHandler'
import { newToken } from '../tokens'
import { sendMail, appUrl } from '../mail'
import type { GroupRole } from '../../../shared/types/roles'

export const INVITATION_DAYS = 14

/**
 * Invite an address into a group with a role: the invitation row and its mail in one
 * transaction (a mail that cannot be sent leaves no invitation). Nobody joins without
 * accepting, and the work and the answer are the same whether or not the address has an
 * account, so that inviting tells the owner nothing about other people's accounts.
 */
export async function inviteToGroup(group: { id: number; name: string }, inviter: { id: number; displayName: string }, input: { email: string; role: GroupRole }) {
  return useDb().transaction(async (trx) => {
    if (await isMemberAddress(trx, group.id, input.email)) fail(409, `${input.email} is already a member; change the role instead`)
    const { token, hash } = newToken()
    const [row] = await trx('invitations')
      .insert({
        group_id: group.id,
        email: input.email,
        role: input.role,
        token_hash: hash,
        invited_by: inviter.id,
        expires_at: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
      })
      .returning(['id', 'email', 'role', 'expires_at as expiresAt'])
    await sendMail(
      {
        to: input.email,
        subject: `${inviter.displayName} invites you to ${group.name} on Scalewright`,
        text: `${inviter.displayName} invites you to the group "${group.name}" on Scalewright as ${input.role}.\n\nAccept here (valid ${INVITATION_DAYS} days, once):\n${appUrl(`/join/${token}`)}\n`,
      },
      { db: trx, failure: 'The invitation mail could not be sent, so no invitation was made; try again later' },
    )
    return row as { id: number; email: string; role: GroupRole; expiresAt: Date }
  })
}
