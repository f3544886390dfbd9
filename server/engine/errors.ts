/**
 * Typed errors of the Scalewright engine. Routes map EngineInputError to HTTP 422 with
 * its message; anything else is a bug (500). A message names the function at fault and
 * repeats the bad value, so that a user can see what to change.
 */
export class EngineError extends Error {
  constructor(message: string) {
    super(message)
    this.name = 'EngineError'
  }
}

/** The input is well-formed JSON but asks for something the engine cannot do. */
export class EngineInputError extends EngineError {
  constructor(fn: string, message: string) {
    super(`${fn}: ${message}`)
    this.name = 'EngineInputError'
  }
}

/** A run was cancelled by its owner; partial results are discarded. */
export class EngineCancelledError extends EngineError {
  constructor(what = 'run') {
    super(`${what} cancelled`)
    this.name = 'EngineCancelledError'
  }
}

/** An internal consistency check failed (e.g. two primes disagree); never hidden. */
export class EngineConsistencyError extends EngineError {
  constructor(fn: string, message: string) {
    super(`${fn}: ${message}`)
    this.name = 'EngineConsistencyError'
  }
}
