/**
 * The engine's entry for a theory file from outside (CLI, worker, seeds): parse and validate
 * it with the shared TheorySchema and throw the engine's input error on any problem.
 */
import { EngineInputError } from '../errors'
import { TheorySchema, formatTheoryIssues, type Theory } from '../../../shared/schemas/theory'

/**
 * Parse and validate a theory file (a JSON string or an already parsed object).
 * Throws EngineInputError whose message lists every problem, one per line, e.g.
 * `Field 3 "phi", charge under Y: a real scalar must have zero U(1) charges, but this one is 1/3`.
 */
export function parseTheory(json: unknown): Theory {
  let input = json
  if (typeof json === 'string') {
    try {
      input = JSON.parse(json)
    } catch (e) {
      throw new EngineInputError('parseTheory', `The theory file is not valid JSON (${(e as Error).message}); check its brackets, commas and quotes`)
    }
  }
  const result = TheorySchema.safeParse(input)
  if (!result.success) throw new EngineInputError('parseTheory', formatTheoryIssues(input, result.error.issues))
  return result.data
}
