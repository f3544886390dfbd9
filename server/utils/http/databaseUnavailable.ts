import { createError, setResponseHeader, type H3Error, type H3Event } from 'h3'

/**
 * Errors that mean "PostgreSQL cannot be reached right now" (stopped, restarting, crashed, the
 * connection dropped), as opposed to a bug. They become 503 with Retry-After, so that a user
 * reads that the database is away rather than "Internal error", and the app needs no restart:
 * the connection pools open new connections once PostgreSQL is back.
 */
const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN'])
// SQLSTATE class 08 (connection exception), 57P01–57P03 (shutting down, crashed, not yet
// accepting connections), 53300 (too many connections).
const SQLSTATES = new Set(['08000', '08001', '08003', '08004', '08006', '57P01', '57P02', '57P03', '53300'])
const MESSAGES = [
  /Connection terminated/i,
  /Knex: Timeout acquiring a connection/i,
  /Client has encountered a connection error/i,
  /the database system is (starting up|shutting down|in recovery mode)/i,
]

export const RETRY_AFTER_SECONDS = 5
export const DATABASE_UNAVAILABLE_MESSAGE =
  'The database is unavailable at the moment (it may be restarting); retrying. ' + 'This request may not have been saved: check, and try again in a few seconds.'

export function isDatabaseUnavailable(error: unknown): boolean {
  for (let e = error as { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string' && (NETWORK_CODES.has(e.code) || SQLSTATES.has(e.code))) return true
    if (typeof e.message === 'string' && MESSAGES.some((m) => m.test(e!.message as string))) return true
    // Node reports a refused connection to every address of a name as an AggregateError.
    if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner))) return true
  }
  return false
}

/** The 503 for a database that cannot be reached, or undefined for any other error. */
export function databaseUnavailableError(event: H3Event, error: unknown): H3Error | undefined {
  if (!isDatabaseUnavailable(error)) return undefined
  setResponseHeader(event, 'Retry-After', RETRY_AFTER_SECONDS)
  return createError({
    statusCode: 503,
    statusMessage: 'Service Unavailable',
    message: DATABASE_UNAVAILABLE_MESSAGE,
    data: { message: DATABASE_UNAVAILABLE_MESSAGE, retryAfterSeconds: RETRY_AFTER_SECONDS },
  })
}
