import { createError, setResponseHeader, type H3Error, type H3Event } from 'h3'
import { EngineInputError } from '../../engine/errors'

/** Too much work waiting (for this user or for everyone): 429 with Retry-After. */
export class ComputeBusyError extends Error {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message)
    this.name = 'ComputeBusyError'
  }
}

/** A computation overran its time budget: 422 (the input asks for too much), never retried. */
export class ComputeBudgetError extends EngineInputError {
  constructor(message: string) {
    super('compute pool', message)
    this.name = 'ComputeBudgetError'
  }
}

/** The 429 for a ComputeBusyError, or undefined for any other error. */
export function computeBusyError(event: H3Event, error: unknown): H3Error | undefined {
  if (!(error instanceof ComputeBusyError)) return undefined
  setResponseHeader(event, 'Retry-After', error.retryAfterSeconds)
  return createError({ statusCode: 429, statusMessage: 'Too Many Requests', message: error.message, data: { message: error.message, retryAfterSeconds: error.retryAfterSeconds } })
}
