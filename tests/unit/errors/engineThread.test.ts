import { describe, expect, it } from 'vitest'
import { startEngineTask, type EngineTask } from '../../../server/worker/engineTask'
import { fromThreadError, toThreadError } from '../../../server/worker/threadError'
import { EngineCancelledError, EngineConsistencyError, EngineError, EngineInputError } from '../../../server/engine/errors'
import { findPreset } from '../../../shared/presets/index'

// The engine thread posts plain data; the parent must rethrow the same class, message and
// place, so that an input error answers 422 and anything else is an internal error (500).
const scalarQed = findPreset('scalar-qed')!.theory

async function failureOf(task: EngineTask, cancelAfterMs?: number): Promise<Error> {
  const handle = startEngineTask(task, () => {})
  if (cancelAfterMs !== undefined) setTimeout(() => handle.cancel(), cancelAfterMs)
  try {
    await handle.result
  } catch (error) {
    return error as Error
  }
  throw new Error('the task did not fail')
}

describe('errors cross the engine-thread boundary with their class', () => {
  it('an input error of the engine stays an EngineInputError, with its message and place', async () => {
    const e = await failureOf({ kind: 'fingerprint', theory: scalarQed, classKey: 'phi^2', texts: ['<12>'] })
    expect(e).toBeInstanceOf(EngineInputError)
    expect(e).toMatchObject({ where: 'parseClassKey', message: 'The class "phi^2" has fewer than 3 fields; an operator class needs at least 3' })
  })
  it('an invalid theory file stays an EngineInputError naming the field', async () => {
    const e = await failureOf({ kind: 'count', theory: { name: 'x', frame: 'relativistic', groups: [], fields: [{ name: 'D', lorentz: 'scalar' }] }, maxDim: 6 })
    expect(e).toBeInstanceOf(EngineInputError)
    expect(e.message).toBe('Field 1 "D", name cannot be "D", the covariant derivative; choose another name')
  })
  it('a TypeError inside the engine is not an engine error: it keeps its name and stack for the log', async () => {
    // A malformed task (the routes never send one): the operator text is a number.
    const e = await failureOf({ kind: 'fingerprint', theory: scalarQed, classKey: 'phi phi* A_L^2', texts: [42] as never })
    expect(e).not.toBeInstanceOf(EngineError)
    expect(e.name).toBe('TypeError')
    expect(e.stack).toMatch(/server\/engine\//)
  })
  it('a cancelled task rejects with EngineCancelledError', async () => {
    const e = await failureOf({ kind: 'count', theory: findPreset('smeft')!.theory, maxDim: 16, nf: 3 }, 300)
    expect(e).toBeInstanceOf(EngineCancelledError)
  })
  it('each class survives the plain-data form both ways (consistency failures included)', () => {
    const cases = [
      new EngineInputError('parseOperatorText', 'The operator is empty'),
      new EngineConsistencyError('classBasis', 'ranks differ between primes'),
      new EngineCancelledError('operator count'),
    ]
    for (const original of cases) {
      const back = fromThreadError(structuredClone(toThreadError(original)))
      expect(back.constructor).toBe(original.constructor)
      expect(back).toMatchObject({ message: original.message, where: original.where, stack: original.stack })
    }
    const odd = fromThreadError(structuredClone(toThreadError(new RangeError('Invalid array length'))))
    expect(odd).not.toBeInstanceOf(EngineError)
    expect(odd.name).toBe('RangeError')
    expect(toThreadError('a string was thrown').kind).toBe('other')
  })
})
