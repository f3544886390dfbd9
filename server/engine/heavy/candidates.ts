/**
 * Generation of rotation-scalar, parity-even operator structures of a given mass dimension,
 * and of the relation subspace removed by the heavy field's leading-order equation of motion
 * D_t ψ = 0 (operators X·D_t) and its conjugate (operators D_t·X, by parts on ψ†).
 */
import type { Letter, Structure } from './structure'
import { isParityEven, slotCount } from './structure'

const DIM: Record<Letter, number> = { D: 1, T: 1, E: 2, B: 2 }

/** All letter sequences from `alphabet` with total mass dimension `dim`. */
export function letterSequences(dim: number, alphabet: readonly Letter[]): Letter[][] {
  if (dim === 0) return [[]]
  const out: Letter[][] = []
  for (const l of alphabet) {
    if (DIM[l] > dim) continue
    for (const rest of letterSequences(dim - DIM[l], alphabet)) out.push([l, ...rest])
  }
  return out
}

function matchings(slots: number[]): Array<Array<[number, number]>> {
  if (slots.length === 0) return [[]]
  const [first, ...rest] = slots
  const out: Array<Array<[number, number]>> = []
  rest.forEach((other, i) => {
    const remaining = rest.filter((_, j) => j !== i)
    for (const m of matchings(remaining)) out.push([[first!, other], ...m])
  })
  return out
}

/**
 * All index contractions of n slots: perfect matchings (n even) or one ε on three slots and
 * a matching of the rest (n odd).
 * @example contractions(4).length // 3
 */
export function contractions(n: number): Array<{ pairs: Array<[number, number]>; eps?: [number, number, number] }> {
  const slots = Array.from({ length: n }, (_, i) => i)
  if (n % 2 === 0) return matchings(slots).map((pairs) => ({ pairs }))
  const out: Array<{ pairs: Array<[number, number]>; eps?: [number, number, number] }> = []
  for (let a = 0; a < n; a++) for (let b = a + 1; b < n; b++) for (let c = b + 1; c < n; c++) {
    const rest = slots.filter((s) => s !== a && s !== b && s !== c)
    for (const pairs of matchings(rest)) out.push({ pairs, eps: [a, b, c] })
  }
  return out
}

/** Every contracted structure (with and without σ) on the given letter sequences, parity even. */
export function structuresOn(sequences: readonly Letter[][]): Structure[] {
  const out: Structure[] = []
  for (const letters of sequences) {
    for (const spin of [false, true]) {
      const probe: Structure = { letters, spin, pairs: [] }
      if (!isParityEven(probe)) continue
      for (const c of contractions(slotCount(probe))) out.push({ letters, spin, pairs: c.pairs, eps: c.eps })
    }
  }
  return out
}

/**
 * Candidate structures for operators ψ† O ψ with dim O = dim: first products of D, E, B
 * (preferred: field strengths written as E and B), then words in D and D_t with D_t only in
 * the interior (those alone span the quotient; words with D_t at an end vanish by the EOM).
 */
export function candidateStructures(dim: number): Structure[] {
  const nice = letterSequences(dim, ['D', 'E', 'B'])
  const words = letterSequences(dim, ['D', 'T']).filter((s) => s[0] !== 'T' && s[s.length - 1] !== 'T')
  const key = (s: Structure): number[] => {
    const nT = s.letters.filter((l) => l === 'T').length
    const nF = s.letters.filter((l) => l === 'E' || l === 'B').length
    return [nT, -nF, s.spin ? 1 : 0, s.eps ? 1 : 0]
  }
  const all = [...structuresOn(nice), ...structuresOn(words.filter((w) => w.includes('T')))]
  return all
    .map((s, i) => ({ s, i, k: key(s) }))
    .sort((x, y) => {
      for (let j = 0; j < x.k.length; j++) if (x.k[j] !== y.k[j]) return x.k[j]! - y.k[j]!
      return x.i - y.i
    })
    .map((x) => x.s)
}

/**
 * Structures X·D_t and D_t·X with X any parity-even scalar word of dimension dim − 1: they
 * span the operators removed by the heavy-field EOM (integration by parts built in).
 */
export function relationStructures(dim: number): Structure[] {
  if (dim < 1) return []
  const xs = structuresOn(letterSequences(dim - 1, ['D', 'T']))
  const out: Structure[] = []
  for (const x of xs) {
    out.push({ ...x, letters: [...x.letters, 'T'] })
    out.push({ ...x, letters: ['T', ...x.letters] })
  }
  return out
}

/**
 * Colour-trace structures tr(F F …)·1 of dimension dim built from E and B only (for SU(N)
 * with N ≥ 2; covariant derivatives inside a trace are not generated, so dimension ≤ 4).
 * @example tracedStructures(4).length // 8: tr(E E), tr(E B), tr(B E), tr(B B) with/without σ, parity even ones kept
 */
export function tracedStructures(dim: number): Structure[] {
  return structuresOn(letterSequences(dim, ['E', 'B'])).map((s) => ({ ...s, traced: true }))
}
