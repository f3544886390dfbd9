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

/** Coverage of every class of a basis, keyed by class key. */
export async function coverageOfClasses(basisId: number, classes: { key: string, rank: number }[]) {
  const out: Record<string, { rank: number, required: number, complete: boolean }> = {}
  for (const c of classes) {
    const { rank, required, complete } = await classCoverage(basisId, c.key, c.rank)
    out[c.key] = { rank, required, complete }
  }
  return out
}
