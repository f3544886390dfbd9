import { EngineError } from '../../server/engine/errors'

/** The engine error `f` throws (fails the test when it throws nothing or something else). */
export function engineErrorOf(f: () => unknown): EngineError {
  try {
    f()
  } catch (error) {
    if (error instanceof EngineError) return error
    throw error
  }
  throw new Error('expected an engine error, but nothing was thrown')
}
