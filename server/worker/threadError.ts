import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../engine/errors'

/** How an error thrown in the engine thread is answered: its class, kept across the thread boundary. */
export type ThreadErrorKind = 'input' | 'consistency' | 'cancelled' | 'other'

/** An error as the engine thread posts it (structured clone keeps plain data, not classes). */
export interface ThreadErrorMessage {
  type: 'error'
  kind: ThreadErrorKind
  name: string
  message: string
  where: string
  stack?: string
}

/** The plain-data form of an error thrown in the engine thread. */
export function toThreadError(error: unknown): ThreadErrorMessage {
  const e = error instanceof Error ? error : new Error(String(error))
  const kind: ThreadErrorKind = e instanceof EngineInputError ? 'input' : e instanceof EngineConsistencyError ? 'consistency' : e instanceof EngineCancelledError ? 'cancelled' : 'other'
  const where = 'where' in e && typeof e.where === 'string' ? e.where : ''
  return { type: 'error', kind, name: e.name, message: e.message, where, stack: e.stack }
}

/**
 * The error the parent thread rethrows: the same engine class with the same message and `where`,
 * or, for anything unexpected (a TypeError inside the engine, …), a plain Error that keeps the
 * original name and stack for the log and is answered as an internal error.
 */
export function fromThreadError(m: ThreadErrorMessage): Error {
  let error: Error
  if (m.kind === 'input') error = new EngineInputError(m.where, m.message)
  else if (m.kind === 'consistency') error = new EngineConsistencyError(m.where, m.message)
  else if (m.kind === 'cancelled') error = new EngineCancelledError(m.where || undefined)
  else {
    error = new Error(m.message)
    error.name = m.name
  }
  if (m.stack) error.stack = m.stack
  return error
}
