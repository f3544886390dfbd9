/**
 * Which external legs to draw for a class of the Hilbert series with a odd letters (u, χ_−, f_−),
 * b letters χ_+ and c letters f_+: b 's' legs, c 'v' legs and a odd legs, the odd ones spread
 * over the kinds the theory has (Goldstone always, 'p' with scalar sources, 'a' with vector
 * sources), round robin. Patterns whose values vanish identically are left out: two legs with an
 * on-shell Goldstone, and three on-shell Goldstones (all k_i·k_j = 0).
 */
import type { LegKind } from './kinematics'

export interface ClassContent {
  odd: number
  chiPlus: number
  fPlus: number
}

/** Parse a class key of the count ("{u,χ−,f−}^2 χ+ f+^3"). */
export function classContent(key: string): ClassContent {
  const out = { odd: 0, chiPlus: 0, fPlus: 0 }
  for (const part of key.split(' ').filter(Boolean)) {
    const [name, power] = part.split('^') as [string, string | undefined]
    const n = Number(power ?? 1)
    if (name === 'χ+') out.chiPlus += n
    else if (name === 'f+') out.fPlus += n
    else out.odd += n
  }
  return out
}

/**
 * Leg patterns for one class.
 * @example classPatterns({ odd: 2, chiPlus: 0, fPlus: 0 }, ['pion', 'p', 'a']) // [['p','p'], ['p','a'], ['a','a']]
 */
export function classPatterns(c: ClassContent, oddKinds: readonly LegKind[]): LegKind[][] {
  const m = c.odd + c.chiPlus + c.fPlus
  const even: LegKind[] = [...new Array<LegKind>(c.chiPlus).fill('s'), ...new Array<LegKind>(c.fPlus).fill('v')]
  const out: LegKind[][] = []
  const rec = (k: number, left: number, acc: LegKind[]) => {
    if (k === oddKinds.length - 1) {
      const legs = [...acc, ...new Array<LegKind>(left).fill(oddKinds[k]!), ...even]
      const pions = legs.filter((x) => x === 'pion').length
      if (!(m === 2 && pions > 0) && !(m === 3 && pions === 3)) out.push(legs)
      return
    }
    for (let n = left; n >= 0; n--) rec(k + 1, left - n, [...acc, ...new Array<LegKind>(n).fill(oddKinds[k]!)])
  }
  rec(0, c.odd, [])
  return out
}
