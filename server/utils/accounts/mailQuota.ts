import type { Knex } from 'knex'
import { lockKey } from '../auth/throttle'

// Account mails (sign-up links and notices, reset links and notices): at most this many per
// address, purpose and hour, whether or not the address has an account; more requests get the
// same answer and no mail, so nobody can flood an inbox through the app.
export const ACCOUNT_MAILS_PER_HOUR = 3
export type MailPurpose = 'sign-up' | 'reset'

/**
 * Count one mail of `purpose` to `address` if the hour's quota allows it (inside the caller's
 * transaction, under a lock on the address, so parallel requests cannot overshoot).
 */
export async function takeMailQuota(trx: Knex.Transaction, address: string, purpose: MailPurpose): Promise<boolean> {
  const hourAgo = new Date(Date.now() - 3_600_000)
  await lockKey(trx, `mail|${purpose}|${address}`)
  const sent = await trx('account_mails').where({ address, purpose }).andWhere('created_at', '>', hourAgo).count<{ count: string }[]>('id as count')
  if (Number(sent[0]!.count) >= ACCOUNT_MAILS_PER_HOUR) return false
  await trx('account_mails').insert({ address, purpose })
  await trx('account_mails').where('created_at', '<', hourAgo).delete()
  return true
}
