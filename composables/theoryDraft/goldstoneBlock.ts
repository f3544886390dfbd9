// The Goldstone block of a theory file ("frame": "goldstone") as editor inputs, and back.
// (Outside composables/' top level, so Nuxt does not auto-import it.)
import type { DraftIssue } from './draftTypes'
import { asText, isRecord } from './labels'

export interface DraftGoldstone {
  coset: 'chiral' | 'orthogonal'
  /** Typed N (a whole number) or "general". */
  N: string
  scalar: boolean
  vector: boolean
  /** The singlet vector source v_μ of U(1)_V (chiral coset, counts only). */
  singletVector: boolean
  theta: boolean
  /** Highest chiral order, an even power of p (2 … 14), typed. */
  maxOrder: string
  decayConstant: string
  goldstoneName: string
  description?: string
}

/** A fresh block: three light flavors with all sources, to p⁴. */
export function newGoldstone(): DraftGoldstone {
  return { coset: 'chiral', N: '3', scalar: true, vector: true, singletVector: false, theta: false, maxOrder: '4', decayConstant: '', goldstoneName: '' }
}

export function goldstoneToDraft(input: unknown): DraftGoldstone {
  const g = isRecord(input) ? input : {}
  const sources = isRecord(g.sources) ? g.sources : {}
  return {
    coset: g.coset === 'orthogonal' ? 'orthogonal' : 'chiral',
    N: asText(g.N),
    scalar: sources.scalar === true,
    vector: sources.vector === true,
    singletVector: sources.singletVector === true,
    theta: g.theta === true,
    maxOrder: asText(g.maxOrder),
    decayConstant: asText(g.decayConstant),
    goldstoneName: asText(g.goldstoneName),
    ...(g.description !== undefined ? { description: asText(g.description) } : {}),
  }
}

export function goldstoneToTheory(d: DraftGoldstone, issues: DraftIssue[]): Record<string, unknown> {
  const out: Record<string, unknown> = { coset: d.coset }
  const n = d.N.trim()
  if (n === 'general') out.N = 'general'
  else if (/^\d{1,3}$/.test(n)) out.N = Number(n)
  else issues.push({ path: ['goldstone', 'N'], message: n ? `N is a whole number or "general", but got "${n}"` : 'N is needed: the number of light flavors (or "general")' })
  out.sources = { scalar: d.scalar, vector: d.vector, ...(d.singletVector ? { singletVector: true } : {}) }
  if (d.theta) out.theta = true
  const k = d.maxOrder.trim()
  if (/^\d{1,3}$/.test(k)) out.maxOrder = Number(k)
  else
    issues.push({
      path: ['goldstone', 'maxOrder'],
      message: k ? `the highest chiral order is an even power of p (2 to 14), but got "${k}"` : 'choose the highest chiral order (an even power of p, 2 to 14)',
    })
  if (d.decayConstant.trim()) out.decayConstant = d.decayConstant.trim()
  if (d.goldstoneName.trim()) out.goldstoneName = d.goldstoneName.trim()
  if (d.description !== undefined) out.description = d.description
  return out
}
