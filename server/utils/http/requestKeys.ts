import { createHash } from 'node:crypto'
import { getHeader, getResponseStatus, setResponseHeader, setResponseStatus, type H3Event } from 'h3'
import { useDb } from '../db/connection'
import { fail } from './apiHandler'

// Double submission guard for create routes. The page sends an Idempotency-Key header that
// stays the same until the form's request succeeds (composables/useSubmitOnce.ts); the server
// remembers (user, key) for a day with the answer, so a request sent twice — a double click,
// a retried connection — is done once and both get the same answer.
const HEADER = 'idempotency-key'
const KEEP = '24 hours'
const WAIT_MS = 15_000
const POLL_MS = 100

/** The request's key, or null when it has none (then nothing is remembered); 400 when malformed. */
export function requestKey(event: H3Event): string | null {
  const raw = getHeader(event, HEADER)
  if (!raw) return null
  if (!/^[A-Za-z0-9_-]{8,100}$/.test(raw)) fail(400, 'Idempotency-Key: 8 to 100 letters, digits, "-" or "_"; reload the page and send the form again')
  return raw
}

/**
 * Do `work` once per (user, key): the first request claims the key and stores its answer; a
 * repeat waits for that answer (up to WAIT_MS) and replays it with the same status. A failed
 * first attempt lets go of the key, so a repeat is done afresh. Without a key, just `work()`.
 */
export async function once<T>(event: H3Event, userId: number, body: unknown, work: () => Promise<T>): Promise<T> {
  const key = requestKey(event)
  if (!key) return work()
  const hash = createHash('sha256')
    .update(`${event.method} ${event.path}\n${JSON.stringify(body ?? null)}`)
    .digest('hex')
  const earlier = await claimOrWait(userId, key, hash)
  if (earlier) {
    setResponseStatus(event, earlier.status)
    setResponseHeader(event, 'idempotent-replayed', 'true')
    return earlier.response as T
  }
  const row = useDb()('request_keys').where({ user_id: userId, key })
  try {
    const out = await work()
    await row.clone().update({ status: getResponseStatus(event), response: JSON.stringify(out ?? null) })
    return out
  } catch (error) {
    await row
      .clone()
      .delete()
      .catch(() => {})
    throw error
  }
}

/** Claim the key (null), or the stored answer of the request that claimed it first. */
async function claimOrWait(userId: number, key: string, hash: string): Promise<{ status: number; response: unknown } | null> {
  const db = useDb()
  const until = Date.now() + WAIT_MS
  for (;;) {
    // A key older than a day is forgotten: its row is taken over as if it were new.
    const claimed = await db.raw(
      `insert into request_keys (user_id, key, request_hash) values (?, ?, ?)
      on conflict (user_id, key) do update set request_hash = excluded.request_hash, status = null, response = null, created_at = now()
      where request_keys.created_at < now() - interval '${KEEP}' returning key`,
      [userId, key, hash],
    )
    if (claimed.rows.length) {
      await db('request_keys')
        .where('created_at', '<', db.raw(`now() - interval '${KEEP}'`))
        .delete()
      return null
    }
    const row = await db('request_keys').where({ user_id: userId, key }).first('request_hash', 'status', 'response')
    if (row && row.request_hash !== hash) fail(422, 'This form was already sent once with other contents; reload the page and send it again')
    if (row?.status) return { status: row.status, response: row.response }
    if (Date.now() > until) fail(409, 'The same request is still being done (it was sent twice); reload the page in a moment to see its result')
    await new Promise((r) => setTimeout(r, row ? POLL_MS : 0))
  }
}
