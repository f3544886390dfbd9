import { afterEach, describe, expect, it, vi } from 'vitest'
import { createError } from 'h3'
import { z } from 'zod'
import { toHttpError, ERROR_CLASSIFIERS } from '../../../server/utils/http/apiHandler'
import { EngineCancelledError, EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'
import { errorReference } from '../../../server/utils/internalError'
import { forbiddenIn } from '../../support/forbiddenMessages'

// The one error mapper: input errors 422 with their message, schema errors 400 in the user's
// words, anything unexpected 500 with a reference that is also in the log.
const INTERNAL = /^Internal error \(ref ([0-9A-HJKMNP-TV-Z]{6})\); it has been logged\.$/

describe('toHttpError', () => {
  afterEach(() => {
    vi.restoreAllMocks()
  })

  it('an engine input error answers 422 with its message, never its place', () => {
    const r = toHttpError(new EngineInputError('parseOperatorText', 'The operator is empty; type it in the input syntax, e.g. <12>[34]'))
    expect(r.statusCode).toBe(422)
    expect(r.data).toEqual({ message: 'The operator is empty; type it in the input syntax, e.g. <12>[34]' })
  })

  it.each([
    ['a failed consistency check', new EngineConsistencyError('classBasis', 'ranks differ between primes 2^25−39 and 2^25−91')],
    ['a TypeError', new TypeError("Cannot read properties of undefined (reading 'legs')")],
    ['a cancelled engine task outside a time limit', new EngineCancelledError('basis')],
    ['a 500 from a library', createError({ statusCode: 500, message: 'relation "runs" does not exist' })],
    ['a thrown string', 'boom'],
  ])('%s answers 500 with a reference that the log carries too', (_what, error) => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {})
    const r = toHttpError(error)
    expect(r.statusCode).toBe(500)
    const text = (r.data as { message: string }).message
    const ref = INTERNAL.exec(text)?.[1]
    expect(ref, text).toBeDefined()
    expect(r.message).toBe(text)
    expect(log).toHaveBeenCalledOnce()
    expect(String(log.mock.calls[0]![0])).toContain(`ref ${ref}`)
    expect(log.mock.calls[0]![1]).toBe(error)
  })

  it("a schema error answers 400 naming the field in the user's words, no zod text", () => {
    const schema = z.object({ maxDim: z.number().int().min(5) }).strict()
    const r = toHttpError(schema.safeParse({ maxDim: 2, extra: 1 }).error)
    expect(r.statusCode).toBe(400)
    const text = (r.data as { message: string }).message
    expect(text).toBe('Maximum dimension must be at least 5; The request has an unknown key "extra"; check the spelling or remove it')
    expect(forbiddenIn(text)).toEqual([])
  })

  it('HTTP errors thrown on purpose pass through unchanged', () => {
    const conflict = createError({ statusCode: 409, message: 'This run is already cancelled', data: { message: 'This run is already cancelled' } })
    expect(toHttpError(conflict)).toBe(conflict)
  })

  it('the classifiers are one list that a new case can join (e.g. an unavailable database → 503)', () => {
    expect(ERROR_CLASSIFIERS.length).toBeGreaterThan(0)
    class Unavailable extends Error {}
    const answer = createError({ statusCode: 503, message: 'The database is unavailable; retrying', data: { message: 'The database is unavailable; retrying' } })
    ERROR_CLASSIFIERS.unshift((e) => (e instanceof Unavailable ? answer : undefined))
    try {
      expect(toHttpError(new Unavailable())).toBe(answer)
    } finally {
      ERROR_CLASSIFIERS.shift()
    }
  })

  it('references are six letters of an unambiguous alphabet, and differ', () => {
    const refs = new Set(Array.from({ length: 200 }, errorReference))
    expect(refs.size).toBe(200)
    for (const r of refs) expect(r).toMatch(/^[0-9A-HJKMNP-TV-Z]{6}$/)
  })
})
