// The board's engine work that routes ask for (coverage, rank checks, rewrites, counting-rule
// views, exports). Run in the compute pool's threads (computeTasks.ts), never on the event loop:
// a class can hold hundreds of operators, and its rank is exact linear algebra.
import { coverageOf, firstRedundant, keptRank, rewriteOnto, type ClassOperator, type Coverage, type Rewrite } from '../engine/board/keptSet'
import { expressIn, type Fingerprint } from '../engine/board/fingerprints'
import { typedFingerprints } from '../engine/board/typedOperator'
import { typedRewritePlan } from '../engine/board/fingerprintVersion'
import { goldstoneTypedFingerprints, type GoldstoneTypedInput } from '../engine/goldstone/explicit/typedGoldstone'
import { ruleOrders, rulesOf, type RuleTheory } from '../engine/board/ruleOrders'
import { assembleExport } from '../engine/export/boardExport'
import { toLatex } from '../engine/export/toLatex'
import { toCsv } from '../engine/export/toCsv'
import { toString as ratString, isZero } from '../engine/exact/rational'
import { parseTheory } from '../engine/theory/parseTheory'
import { describeOperator } from '../utils/board/importPlan'
import type { Priorities } from '../engine/basis/classBasis'

export interface BoardOperator extends ClassOperator {
  class_key: string
  order: number
  position: number
}
export interface CoverageClass {
  key: string
  rank: number
}
export type CoverageMap = Record<string, { rank: number; required: number; complete: boolean }>

/** Coverage of the given classes from the operators as stored now. */
function coverageFrom({ ops, classes }: { ops: BoardOperator[]; classes: CoverageClass[] }): CoverageMap {
  const byClass = new Map<string, BoardOperator[]>()
  for (const o of ops) byClass.set(o.class_key, [...(byClass.get(o.class_key) ?? []), o])
  const out: CoverageMap = {}
  for (const c of classes) {
    const { rank, required, complete } = coverageOf(c.key, byClass.get(c.key) ?? [], c.rank)
    out[c.key] = { rank, required, complete }
  }
  return out
}

export interface MoveInput {
  classKey: string
  ops: ClassOperator[]
  movedId: number
  keeping: boolean
  settingAside: boolean
  required: number
}

/**
 * What a move of one operator gives, on the class's operators as they will be after it: the
 * reason a keep is refused (the kept set would be redundant), else the coverage and the
 * rewrite of an operator set aside.
 */
type MoveMath = { refusal: string; coverage: null; rewrite: null } | { refusal: null; coverage: Coverage; rewrite: Rewrite | null }
function moveMath(m: MoveInput): MoveMath {
  const refusal = m.keeping ? redundantKeep(m) : null
  if (refusal) return { refusal, coverage: null, rewrite: null }
  return { refusal: null, coverage: coverageOf(m.classKey, m.ops, m.required), rewrite: m.settingAside ? rewriteOnto(m.ops, m.movedId) : null }
}

/** Why keeping the operator would make the kept set redundant, or null when it would not. */
function redundantKeep({ classKey, ops, movedId, required }: MoveInput): string | null {
  const others = ops.filter((o) => o.column === 'kept' && o.id !== movedId)
  const withIt = [...others, ops.find((o) => o.id === movedId)!]
  const printed = withIt.every((o) => o.fingerprint)
  if (printed ? keptRank(withIt) > keptRank(others) : others.length < required) return null
  const named =
    others
      .slice(0, 3)
      .map((o) => o.text || `#${o.id}`)
      .join(', ') + (others.length > 3 ? ', …' : '')
  const why = !printed
    ? `the class needs ${required} kept operator${required === 1 ? '' : 's'} and has ${others.length} already`
    : others.length
      ? `it is a combination of the kept operator${others.length === 1 ? '' : 's'} ${named}`
      : 'it vanishes modulo equations of motion and integration by parts'
  return `Keeping this operator would make the kept set of class ${classKey} redundant: ${why}. Set one of them aside first.`
}

/** An import's kept sets judged class by class: the refusal naming the redundant operators, else the coverage after it. */
type ImportMath = { refusal: string; coverage: null } | { refusal: null; coverage: CoverageMap }
function importMath({ after, classes }: { after: BoardOperator[]; classes: CoverageClass[] }): ImportMath {
  const problems: string[] = []
  for (const c of classes) {
    const kept = after.filter((o) => o.class_key === c.key && o.column === 'kept').sort((a, b) => a.position - b.position)
    const index = firstRedundant(kept, c.rank)
    if (index === null) continue
    const why = kept.every((o) => o.fingerprint) ? 'is a combination of the kept operators before it' : `is one more than the ${c.rank} the class needs`
    problems.push(`${describeOperator(kept[index]!)} ${why} (the class needs ${c.rank} independent operator${c.rank === 1 ? '' : 's'}, the file keeps ${kept.length})`)
  }
  if (!problems.length) return { refusal: null, coverage: coverageFrom({ ops: after, classes }) }
  const shown = problems.slice(0, 3).join('; ') + (problems.length > 3 ? `; and ${problems.length - 3} more classes` : '')
  return {
    refusal: `This file would make the kept set of ${problems.length} class${problems.length === 1 ? '' : 'es'} redundant: ${shown}. Set those operators aside in the file (or keep fewer); nothing was changed.`,
    coverage: null,
  }
}

/** The rules a basis can be viewed under, and every operator's order under the one named. */
function ruleView({ theory, ruleName, ops }: { theory: RuleTheory; ruleName?: string; ops: { id: number; classKey: string; terms?: Record<string, number>[] }[] }) {
  const rules = rulesOf(theory).map((r) => ({ name: r.name, kind: r.kind, parameter: r.parameter ?? null }))
  if (!ruleName) return { rules, rule: null, orders: {} }
  return { rules, rule: ruleName, orders: ruleOrders(theory, ruleName, ops) }
}

export type ExportInput = Parameters<typeof assembleExport>[0]
/** A basis export as the text of the file asked for. */
function boardExport({ data, format, dirac }: { data: ExportInput; format: 'latex' | 'csv' | 'json'; dirac: boolean }): string {
  const assembled = assembleExport(data)
  if (format === 'latex') return toLatex(assembled, { dirac })
  if (format === 'csv') return toCsv(assembled)
  return JSON.stringify(assembled, null, 2)
}

export interface TypedRewriteInput {
  theory: unknown
  classKey: string
  typed: string
  priorities?: Priorities
  /** The basis's `fingerprint_version`: whether the stored fingerprints can be compared with new ones. */
  fingerprintVersion: number | null
  kept: { id: number; latex: string; text: string; fingerprint: Fingerprint }[]
  /** A Goldstone-frame order: its points are recomputed from (order, N, sources) and its kept operators fingerprinted again. */
  goldstone?: GoldstoneTypedInput
}
/**
 * A typed operator placed at the class's points and written in terms of the kept operators
 * (whose fingerprints are recomputed from their texts when the stored ones came from other sampling code).
 */
function typedRewrite(a: TypedRewriteInput) {
  let keptPrints: Fingerprint[]
  let typed: Fingerprint & { timesI?: boolean }
  if (a.goldstone) {
    const prints = goldstoneTypedFingerprints(a.goldstone, [...a.kept.map((k) => k.text), a.typed])
    keptPrints = prints.slice(0, -1)
    typed = prints[prints.length - 1]!
  } else {
    const plan = typedRewritePlan(
      a.fingerprintVersion,
      a.kept.map((k) => k.text),
      a.typed,
    )
    const prints = typedFingerprints(parseTheory(a.theory), a.classKey, plan.texts, a.priorities)
    keptPrints = plan.useStored ? a.kept.map((k) => k.fingerprint) : prints.slice(0, -1)
    typed = prints[prints.length - 1]!
  }
  const combo = expressIn(keptPrints, typed)
  if (!combo) return null
  const terms = combo.coefficients
    .map((c, i) => ({ c, k: a.kept[i]! }))
    .filter(({ c }) => !isZero(c))
    .map(({ c, k }) => ({ operatorId: k.id, latex: k.latex, coefficient: ratString(c) }))
  // timesI: the typed operator's amplitude is i times the combination (a dual, σ^{μν} or an explicit i).
  return { vanishes: terms.length === 0, terms, timesI: typed.timesI === true }
}

export const BOARD_TASKS = {
  coverage: coverageFrom,
  moveMath,
  importMath,
  rewriteOnto: (a: { ops: ClassOperator[]; operatorId: number }) => rewriteOnto(a.ops, a.operatorId),
  ruleView,
  boardExport,
  typedRewrite,
}
