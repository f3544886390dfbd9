/**
 * Expansions done right after parsing: □ by the product rule, two-sided derivatives
 * A D↔_μ B = A (D_μ B) − (D_μ A) B (a generator written on D↔ stands between the fields),
 * and (…)^T marking the fields inside as transposed.
 */
import { EngineInputError } from '../errors'
import { mul, neg, rat } from '../exact/rational'
import type { FieldItem, Item, MatrixItem, ParsedOperator, Term } from './ast'

/**
 * Expand two-sided derivatives: A D↔_μ B = A (D_μ B) − (D_μ A) B, with a generator written
 * on it (D↔^I) standing between the fields. Marked while parsing by a derivative item.
 */
/** □(f_1 … f_n) = Σ_i (□f_i) Π_{j≠i} f_j + 2 Σ_{i<j} (D_μ f_i)(D^μ f_j) …, the product rule. */
export function expandBox(op: ParsedOperator): ParsedOperator {
  const out: Term[] = []
  const queue = op.terms.slice()
  while (queue.length > 0) {
    const t = queue.shift()!
    if (!findBoth(t.items, 'Box')) {
      out.push(t)
      continue
    }
    const { list, i } = findBoth(t.items, 'Box')!
    const group = list[i + 1]
    const n = group?.kind === 'group' ? group.items.filter((x) => x.kind === 'field').length : 0
    for (let a = 0; a < n; a++) {
      for (let b = a; b < n; b++) {
        const copy = structuredClone(t)
        const at = findBoth(copy.items, 'Box')!
        const fields = (at.list[at.i + 1] as { items: Item[] }).items.filter((x): x is FieldItem => x.kind === 'field')
        const name = `\u0001box${list[i]!.pos}`
        fields[a]!.derivs.push({ name, pos: list[i]!.pos })
        fields[b]!.derivs.push({ name, pos: list[i]!.pos })
        at.list.splice(at.i, 1)
        queue.push(a === b ? copy : { ...copy, coeff: mul(copy.coeff, rat(2)) })
      }
    }
  }
  return { ...op, terms: out }
}

export function expandBoth(op: ParsedOperator): ParsedOperator {
  const out: Term[] = []
  const queue = op.terms.slice()
  while (queue.length > 0) {
    const t = queue.shift()!
    const at = findBoth(t.items)
    if (!at) {
      out.push(t)
      continue
    }
    for (const side of [1, -1] as const) {
      const copy = structuredClone(t)
      const { list, i } = findBoth(copy.items)!
      const marker = list[i] as MatrixItem
      const field = neighbour(list, i, side)
      if (!field)
        throw new EngineInputError('readOperator', `At position ${marker.pos + 1} of "${op.text}": a two-sided derivative needs a field on each side, e.g. H^\\dagger \\overleftrightarrow{D}_\\mu H`)
      field.derivs.push(marker.indices[0]!)
      const gen = marker.indices.slice(1)
      list.splice(i, 1, ...(gen.length > 0 ? [{ kind: 'matrix', which: 'gen', symbol: 'tau', indices: gen, pos: marker.pos } as MatrixItem] : []))
      queue.push(side === 1 ? copy : { ...copy, coeff: neg(copy.coeff) })
    }
  }
  return { ...op, terms: out }
}

/** (…)^T: every field inside is read transposed (only fermions care: they start a chain as a row). */
export function markTransposed(items: Item[]): void {
  for (const it of items) {
    if (it.kind === 'field') it.transpose = true
    if (it.kind === 'group') markTransposed(it.items)
  }
}

function findBoth(items: Item[], which: 'Dboth' | 'Box' = 'Dboth'): { list: Item[]; i: number } | null {
  for (let i = 0; i < items.length; i++) {
    const it = items[i]!
    if (it.kind === 'matrix' && it.which === which) return { list: items, i }
    if (it.kind === 'group') {
      const f = findBoth(it.items, which)
      if (f) return f
    }
  }
  return null
}

function neighbour(list: Item[], i: number, dir: 1 | -1): FieldItem | null {
  for (let j = i + dir; j >= 0 && j < list.length; j += dir) if (list[j]!.kind === 'field') return list[j] as FieldItem
  return null
}

/** Field names of a theory model and the caller's aliases, as the parser takes them. */
