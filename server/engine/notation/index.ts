/**
 * Operators as papers print them: parse (parse.ts), lower onto a class (lower.ts) and hand
 * the result to the fingerprint machinery as an amplitude target (basis/rewrite.ts).
 */

export { parseNotation, parseOptions } from './parse'
export { checkOperatorList, listCoordinates, judgeList, type CheckReport, type ListCoordinates } from './checkList'
export { lowerOperator } from './lower'
export { notationTarget, isBracketSyntax, type NotationTarget } from './target'
