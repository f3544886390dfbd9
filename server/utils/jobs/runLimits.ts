import type { Knex } from 'knex'
import { ComputeBusyError } from '../compute/computeErrors'

/**
 * Fair, bounded background work: how many runs one person and one group may have waiting or
 * computing, and how long one run may hold a worker, per run kind.
 */
export const RUN_LIMITS = {
  perUser: Number(process.env.SCALEWRIGHT_RUNS_PER_USER) || 3,
  perGroup: Number(process.env.SCALEWRIGHT_RUNS_PER_GROUP) || 6,
  timeMinutes: { count: 10, basis: 15 } as Record<string, number>,
}

const ACTIVE = ['queued', 'running']

/**
 * Inside the transaction that inserts a run: take the group's run lock (so racing requests are
 * counted one after another), refuse with 429 past a limit, and answer the queue priority that
 * interleaves groups: a group's k-th waiting run gets priority −k, so one group's backlog never
 * holds back another group's first run.
 */
export async function admitRun(trx: Knex.Transaction, groupId: number, userId: number): Promise<number> {
  await trx.raw('select pg_advisory_xact_lock(hashtext(?))', [`runs-of-group:${groupId}`])
  const active = (q: Knex.QueryBuilder) => q.from('runs as r').join('theories as t', 't.id', 'r.theory_id').whereIn('r.status', ACTIVE)
  const [{ n: mine }] = await active(trx.queryBuilder()).where('r.created_by', userId).count({ n: '*' })
  if (Number(mine) >= RUN_LIMITS.perUser) {
    throw new ComputeBusyError(`You already have ${mine} runs waiting or computing (the limit is ${RUN_LIMITS.perUser} per person); wait for one to finish or cancel one, then start this run`, 60)
  }
  const [{ n: group, queued }] = await active(trx.queryBuilder()).where('t.group_id', groupId).select(trx.raw('count(*) as n'), trx.raw("count(*) filter (where r.status = 'queued') as queued"))
  if (Number(group) >= RUN_LIMITS.perGroup) {
    throw new ComputeBusyError(
      `This group already has ${group} runs waiting or computing (the limit is ${RUN_LIMITS.perGroup} per group); wait for one to finish or cancel one, then start this run`,
      60,
    )
  }
  return -Number(queued)
}

/** The message of a run stopped at its time limit. */
export function overtimeMessage(kind: string, minutes: number): string {
  return (
    `This ${kind} run took longer than its limit of ${minutes} minutes and was stopped; nothing of it was saved. ` +
    'Ask for less (a lower dimension or order, fewer flavors), or split it into smaller runs'
  )
}
