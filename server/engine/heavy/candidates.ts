/**
 * Generation of rotation-scalar, parity-even operator structures of a given mass dimension,
 * and of the relation subspace removed by the heavy field's leading-order equation of motion
 * D_t ψ = 0 (operators X·D_t) and its conjugate (operators D_t·X, by parts on ψ†).
 */
import type { Combo, Letter, Structure } from './structure'
import { fieldKind, isParityEven, slotCount } from './structure'

const dimOf = (l: Letter): number => (fieldKind(l) ? 2 : 1)

/** All letter sequences from `alphabet` with total mass dimension `dim`. */
export function letterSequences(dim: number, alphabet: readonly Letter[]): Letter[][] {
  if (dim === 0) return [[]]
  const out: Letter[][] = []
  for (const l of alphabet) {
    if (dimOf(l) > dim) continue
    for (const rest of letterSequences(dim - dimOf(l), alphabet)) out.push([l, ...rest])
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
  for (let a = 0; a < n; a++)
    for (let b = a + 1; b < n; b++)
      for (let c = b + 1; c < n; c++) {
        const rest = slots.filter((s) => s !== a && s !== b && s !== c)
        for (const pairs of matchings(rest)) out.push({ pairs, eps: [a, b, c] })
      }
  return out
}

/** Every contracted structure (with and without σ) on the given letter sequences, parity even unless `anyParity`. */
export function structuresOn(sequences: readonly Letter[][], anyParity = false): Structure[] {
  const out: Structure[] = []
  for (const letters of sequences) {
    for (const spin of [false, true]) {
      const probe: Structure = { letters, spin, pairs: [] }
      if (!anyParity && !isParityEven(probe)) continue
      for (const c of contractions(slotCount(probe))) out.push({ letters, spin, pairs: c.pairs, eps: c.eps })
    }
  }
  return out
}

/**
 * Candidate structures for operators ψ† O ψ with dim O = dim: first products of D and the
 * field strengths `fields` (preferred: field strengths written as E and B), then words in D
 * and D_t with D_t only in the interior (those alone span the quotient; words with D_t at an
 * end vanish by the EOM).
 */
export function candidateStructures(dim: number, fields: readonly Letter[] = ['E', 'B'], anyParity = false): Structure[] {
  const nice = letterSequences(dim, ['D', ...fields])
  const words = letterSequences(dim, ['D', 'T']).filter((s) => s[0] !== 'T' && s[s.length - 1] !== 'T')
  const key = (s: Structure): number[] => {
    const nT = s.letters.filter((l) => l === 'T').length
    const nF = s.letters.filter((l) => fieldKind(l)).length
    return [nT, -nF, s.spin ? 1 : 0, s.eps ? 1 : 0]
  }
  const all = [
    ...structuresOn(nice, anyParity),
    ...structuresOn(
      words.filter((w) => w.includes('T')),
      anyParity,
    ),
  ]
  return all
    .map((s, i) => ({ s, i, k: key(s) }))
    .sort((x, y) => {
      for (let j = 0; j < x.k.length; j++) if (x.k[j] !== y.k[j]) return x.k[j]! - y.k[j]!
      return x.i - y.i
    })
    .map((x) => x.s)
}

/**
 * Structures X·D_t and D_t·X with X any scalar word of dimension dim − 1 (parity even unless
 * `anyParity`): they span the operators removed by the heavy-field EOM (integration by parts
 * built in).
 */
export function relationStructures(dim: number, anyParity = false): Structure[] {
  if (dim < 1) return []
  const xs = structuresOn(letterSequences(dim - 1, ['D', 'T']), anyParity)
  const out: Structure[] = []
  for (const x of xs) {
    out.push({ ...x, letters: [...x.letters, 'T'] })
    out.push({ ...x, letters: ['T', ...x.letters] })
  }
  return out
}

/**
 * Colour-trace candidates tr(…)·1 of dimension dim from the non-abelian field strengths
 * `fields` (for SU(N), N ≥ 2): at dimension 4 tr(F F); at dimension 5 tr(F F) D (a derivative
 * on ψ; D tr(F F) follows by conjugation) and tr([D, F] F), tr([D_t, F] F) — covariant
 * derivatives of F written as commutators inside the trace. Lower dimensions have none
 * (tr F = 0).
 * @example tracedCombos(4, ['E', 'B']).length // 8 parity-even ones with/without σ
 */
export function tracedCombos(dim: number, fields: readonly Letter[], anyParity = false): Combo[] {
  const pairs = letterSequences(4, fields)
  if (dim === 4) return structuresOn(pairs, anyParity).map((s) => [{ coef: 1, s: { ...s, trace: [0, 2] } }])
  if (dim !== 5) return []
  const out: Combo[] = []
  for (const s of structuresOn(
    pairs.map((p) => [...p, 'D' as Letter]),
    anyParity,
  ))
    out.push([{ coef: 1, s: { ...s, trace: [0, 2] } }])
  for (const d of ['D', 'T'] as const)
    for (const p of pairs) {
      // tr([d, F1] F2) = tr(d F1 F2) − tr(F1 d F2), both acting on the constant 1
      for (const s of structuresOn([[d, p[0]!, p[1]!]], anyParity)) {
        const swapped = swapFirstTwo(s)
        out.push([
          { coef: 1, s: { ...s, trace: [0, 3] } },
          { coef: -1, s: { ...swapped, trace: [0, 3] } },
        ])
      }
    }
  return out
}

/** The same structure with its first two letters exchanged (their index slots follow them). */
function swapFirstTwo(s: Structure): Structure {
  const off = s.spin ? 1 : 0
  const slotsOf = (i: number) => (s.letters[i] === 'T' ? 0 : 1)
  const a = slotsOf(0)
  const b = slotsOf(1)
  const map = (slot: number): number => {
    const r = slot - off
    if (r < 0 || r >= a + b) return slot
    return r < a ? off + b + r : off + (r - a)
  }
  return {
    letters: [s.letters[1]!, s.letters[0]!, ...s.letters.slice(2)],
    spin: s.spin,
    pairs: s.pairs.map(([x, y]) => [map(x), map(y)] as [number, number]),
    eps: s.eps ? (s.eps.map(map) as [number, number, number]) : undefined,
  }
}
