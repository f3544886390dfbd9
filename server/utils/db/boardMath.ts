import { useDb } from './connection'
import { coverageRank, expressIn, type Fingerprint } from '../../engine/board/fingerprints'
import { toString as ratString, isZero } from '../../engine/exact/rational'

interface OpRow { id: number, latex: string, text: string, column: string, fingerprint: Fingerprint | null, class_key: string }

async function classOperators(basisId: number, classKey: string): Promise<OpRow[]> {
  return useDb()('operators').where({ basis_id: basisId, class_key: classKey }).orderBy(['column', 'position'])
    .select('id', 'latex', 'text', 'column', 'fingerprint', 'class_key')
}

/** Coverage of a class: rank of its kept operators over the required count. */
export async function classCoverage(basisId: number, classKey: string, required: number) {
  const ops = await classOperators(basisId, classKey)
  const kept = ops.filter((o) => o.column === 'kept')
  const prints = kept.map((o) => o.fingerprint).filter((f): f is Fingerprint => !!f)
  const rank = prints.length === kept.length ? coverageRank(prints) : kept.length
  return { classKey, rank, required, complete: rank === required }
}

export interface Rewrite { vanishes: boolean, terms: { operatorId: number, latex: string, coefficient: string }[] }

/**
 * The operator written in terms of the kept operators of its class (excluding itself), or
 * null when it is independent of them (or fingerprints are missing).
 */
export async function rewriteOntoKept(basisId: number, classKey: string, operatorId: number): Promise<Rewrite | null> {
  const ops = await classOperators(basisId, classKey)
  const target = ops.find((o) => o.id === operatorId)
  const kept = ops.filter((o) => o.column === 'kept' && o.id !== operatorId)
  if (!target?.fingerprint || kept.some((o) => !o.fingerprint)) return null
  const combination = expressIn(kept.map((o) => o.fingerprint!), target.fingerprint)
  if (!combination) return null
  const terms = combination.coefficients
    .map((c, i) => ({ c, op: kept[i]! }))
    .filter(({ c }) => !isZero(c))
    .map(({ c, op }) => ({ operatorId: op.id, latex: op.latex, coefficient: ratString(c) }))
  return { vanishes: terms.length === 0, terms }
}

export type CoverageMap = Record<string, { rank: number, required: number, complete: boolean }>

/** Coverage of every class of a basis, keyed by class key: stored, or computed and stored. */
export async function coverageOfClasses(basisId: number, classes: { key: string, rank: number }[]): Promise<CoverageMap> {
  const row = await useDb()('bases').where({ id: basisId }).first('coverage')
  const stored = (row?.coverage ?? {}) as CoverageMap
  if (classes.every((c) => stored[c.key])) return stored
  return recomputeCoverage(basisId, classes)
}

/** Recompute and store coverage of the given classes (all of them after an import). */
export async function recomputeCoverage(basisId: number, classes: { key: string, rank: number }[]): Promise<CoverageMap> {
  const out: CoverageMap = {}
  for (const c of classes) {
    const { rank, required, complete } = await classCoverage(basisId, c.key, c.rank)
    out[c.key] = { rank, required, complete }
  }
  await storeCoverage(basisId, out)
  return out
}

/** Merge class coverages into the stored map (one class after a move). */
export async function storeCoverage(basisId: number, part: CoverageMap) {
  // Bumps the version too: a board cached between the move and this update must not survive it.
  await useDb()('bases').where({ id: basisId }).update({ coverage: useDb().raw('coverage || ?::jsonb', [JSON.stringify(part)]), version: useDb().raw('version + 1') })
}
