/**
 * Typed errors of the Scalewright engine. The message of an input error is written for the
 * physicist who caused it: what was wrong, in their terms, and how to fix it. Where it was
 * raised (`where`, a function name) is kept apart for the server log and never shown.
 *
 * - EngineInputError: the request asks for something the engine cannot do → HTTP 422.
 * - EngineConsistencyError: an internal check failed (a bug) → HTTP 500 with a logged reference.
 * - EngineCancelledError: the owner cancelled, or a time limit stopped the work.
 */
export class EngineError extends Error {
  /** The function that raised the error, for logs only. */
  readonly where: string
  constructor(message: string, where = '') {
    super(message)
    this.name = 'EngineError'
    this.where = where
  }
}

/** The input is well-formed JSON but asks for something the engine cannot do. */
export class EngineInputError extends EngineError {
  constructor(where: string, message: string) {
    super(message, where)
    this.name = 'EngineInputError'
  }
}

/** A run was cancelled by its owner (or stopped by a time limit); partial results are discarded. */
export class EngineCancelledError extends EngineError {
  constructor(what = 'run') {
    super('The computation was cancelled before it finished.', what)
    this.name = 'EngineCancelledError'
  }
}

/** An internal consistency check failed (e.g. two primes disagree); never hidden, never shown. */
export class EngineConsistencyError extends EngineError {
  constructor(where: string, message: string) {
    super(message, where)
    this.name = 'EngineConsistencyError'
  }
}
