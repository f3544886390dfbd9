// A printed operator parsed and lowered onto one class: the target the exact rewrite solves for.
import type { Theory } from '../../../shared/schemas/theory'
import { buildTheoryModel } from '../theory/model'
import type { OperatorClass } from '../basis/classKey'
import type { AmplitudeTarget } from '../basis/rewrite'
import { parseNotation, parseOptions } from './parse'
import { lowerOperator } from './lower'
import type { ParsedOperator } from './ast'

/** A typed operator ready for the rewrite: its amplitude, and whether it is i times that. */
export interface NotationTarget extends AmplitudeTarget {
  timesI: boolean
}

/**
 * Parse and lower a printed operator onto one class.
 * @example notationTarget(smeft, cls("H^3 H*^3"), "(H^\\dagger H)^3").timesI // false
 */
export function notationTarget(theory: Theory, cls: OperatorClass, text: string | ParsedOperator, aliases?: Record<string, string>): NotationTarget {
  const model = buildTheoryModel(theory)
  const op = typeof text === 'string' ? parseNotation(text, parseOptions(model, aliases)) : text
  const low = lowerOperator(model, cls, op)
  return { evaluate: low.evaluate, timesI: low.timesI, label: op.text }
}

/** True when the text is in the bracket amplitude syntax ("<12>[34]", "s13 {g:0}"), not printed notation. */
export function isBracketSyntax(text: string): boolean {
  return /^[\s\d<>[\]s^*/+\-{}g:,.]*$/.test(text) && /[<[]|s\s*\d|^\s*-?\s*\d+(\s*\/\s*\d+)?\s*$/.test(text)
}
