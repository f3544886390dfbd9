/**
 * A canonical text for a monomial, equal for two monomials exactly when they agree up to a sign
 * under the trivial symmetries: cyclicity of traces, order of factors, order of the letters of a
 * determinant, and relabelling of Lorentz indices. Within a letter the derivative indices (and, for
 * u, its own index) are treated as symmetric and the two indices of f or F as antisymmetric, as
 * they are in the free limit, where the candidates only need to span: ∇_[μ u_ν] and [∇_μ, ∇_ν]
 * belong to other letter contents.
 * Method: every letter is coded by its kind, its number of derivatives and the sorted addresses
 * (partner letter position, partner index group) of its index slots; the code is minimized over
 * the orderings of factors and the rotations of traces (brute force: a handful of letters).
 */
import type { Factor, Letter, Monomial } from './monomial'

/** Index group of a slot of a letter: 'S' symmetric (derivatives, and u's own index), 'A' own antisymmetric pair. */
export function slotGroups(l: Letter): string[] {
  const own = l.kind === 'u' ? ['S'] : l.idx.map(() => 'A')
  return [...l.d.map(() => 'S'), ...own]
}

function orderings(factors: readonly Factor[]): Factor[][] {
  // factors of equal type and length may be permuted; traces rotated; determinants permuted
  const perms = (n: number): number[][] => (n <= 1 ? [[0]] : perms(n - 1).flatMap((p) => Array.from({ length: n }, (_, i) => [...p.slice(0, i), n - 1, ...p.slice(i)])))
  const variants = factors.map((f) => {
    if (f.type === 'trace') return f.letters.map((_, r) => ({ type: f.type, letters: [...f.letters.slice(r), ...f.letters.slice(0, r)] }))
    return perms(f.letters.length).map((p) => ({ type: f.type, letters: p.map((i) => f.letters[i]!) }))
  })
  const out: Factor[][] = []
  for (const order of perms(factors.length)) {
    const rec = (i: number, acc: Factor[]) => {
      if (i === order.length) {
        out.push(acc.slice())
        return
      }
      for (const v of variants[order[i]!]!) {
        acc.push(v)
        rec(i + 1, acc)
        acc.pop()
      }
    }
    rec(0, [])
  }
  return out
}

/**
 * Index groups for an exact identity: every derivative slot on its own (∇_μ∇_ν ≠ ∇_ν∇_μ, and
 * ∇_μu_ν ≠ ∇_νu_μ off the free limit); only the own pair of f and F stays antisymmetric.
 */
function exactGroups(l: Letter): string[] {
  return [...l.d.map((_, i) => `D${i}`), ...(l.kind === 'u' ? ['U'] : l.idx.map(() => 'A'))]
}

function codeFor(factors: readonly Factor[], eps: readonly number[] | undefined, groupsOf: (l: Letter) => string[] = slotGroups): string {
  const letters = factors.flatMap((f) => f.letters)
  const where = new Map<number, [number, string][]>()
  letters.forEach((l, pos) => {
    const groups = groupsOf(l)
    ;[...l.d, ...l.idx].forEach((x, s) => {
      const a = where.get(x) ?? []
      a.push([pos, groups[s]!])
      where.set(x, a)
    })
  })
  for (const x of eps ?? []) {
    const a = where.get(x) ?? []
    a.push([-1, 'E'])
    where.set(x, a)
  }
  const partner = (x: number, pos: number, group: string): string => {
    const [a, b] = where.get(x) as [[number, string], [number, string]]
    // (a contraction of two slots of the same group of one letter points at itself)
    const other = a[0] === pos && a[1] === group ? b : a
    return other[0] === -1 ? 'E' : `${other[0]}${other[1]}`
  }
  const letterCode = (l: Letter, pos: number): string => {
    const groups = groupsOf(l)
    const labels = [...l.d, ...l.idx]
    const bySym: string[] = []
    const ordered: string[] = []
    const byAnti: string[] = []
    labels.forEach((x, s) => {
      const g = groups[s]!
      const list = g === 'S' ? bySym : g === 'A' ? byAnti : ordered
      list.push(partner(x, pos, g))
    })
    return `${l.kind}${l.d.length}(${bySym.sort().join(',')}|${ordered.join(',')}|${byAnti.sort().join(',')})`
  }
  let pos = 0
  return factors.map((f) => `${f.type === 'trace' ? 'T' : 'D'}[${f.letters.map((l) => letterCode(l, pos++)).join(' ')}]`).join('') + (eps ? 'ε' : '')
}

/**
 * Canonical code of a monomial (free-limit symmetries: for deduplicating candidates).
 * @example canonicalCode(⟨u_μ u^μ u_ν u^ν⟩) === canonicalCode(⟨u_ν u^ν u_μ u^μ⟩) // true
 */
export function canonicalCode(m: Monomial): string {
  let best: string | null = null
  for (const order of orderings(m.factors)) {
    const c = codeFor(order, m.eps)
    if (best === null || c < best) best = c
  }
  return best ?? ''
}

/**
 * Code equal for two monomials exactly when they are equal up to a sign as operators: only
 * cyclicity, the order of factors and of determinant letters, relabelling, and the antisymmetry
 * of f and F are used (no symmetrization of derivatives). Used before merging terms.
 * @example exactCode(⟨∇_μ u_ν u^μ u^ν⟩) === exactCode(⟨∇_μ u_ν u^ν u^μ⟩) // false (they differ by f₋ terms)
 */
export function exactCode(m: Monomial): string {
  let best: string | null = null
  for (const order of orderings(m.factors)) {
    const c = codeFor(order, m.eps, exactGroups)
    if (best === null || c < best) best = c
  }
  return best ?? ''
}
