/**
 * Contraction plan of one flavor trace: for each letter in order, the Lorentz labels already open
 * (set by earlier letters), those it opens, those it closes (second appearance: summed with η),
 * and those left open after it (still to come in the trace, or shared with other factors or ε).
 * Labels repeated inside one letter (∇^μ f_μν) are summed within the letter.
 */
import type { Letter } from './monomial'

export interface Step {
  letter: Letter
  /** The letter's labels that are not internal to it, in order of first appearance (fixed ones included). */
  own: number[]
  prevOpen: number[]
  fresh: number[]
  closing: number[]
  nextOpen: number[]
}

export interface TracePlan {
  steps: Step[]
  external: number[]
  maxLabel: number
}

export function distinctLabels(letters: readonly Letter[]): number[] {
  const out: number[] = []
  for (const l of letters) for (const x of [...l.d, ...l.idx]) if (!out.includes(x)) out.push(x)
  return out
}

function ownLabels(l: Letter): number[] {
  const labels = [...l.d, ...l.idx]
  return labels.filter((x, i) => labels.indexOf(x) === i && labels.lastIndexOf(x) === i)
}

/**
 * The plan of a trace with these letters in this order.
 * @example compileTrace([u_μ, u^μ], new Set()).steps[1].closing // [μ]
 */
export function compileTrace(letters: readonly Letter[], external: ReadonlySet<number>, fixed: ReadonlySet<number> = new Set()): TracePlan {
  const steps: Step[] = []
  let open: number[] = []
  letters.forEach((letter, t) => {
    const own = ownLabels(letter)
    const later = new Set(letters.slice(t + 1).flatMap((l) => [...l.d, ...l.idx]))
    const fresh = own.filter((x) => !open.includes(x) && !fixed.has(x))
    const closing = own.filter((x) => open.includes(x) && !external.has(x))
    const nextOpen = [...open, ...fresh].filter((x) => !closing.includes(x) && (external.has(x) || later.has(x))).sort((a, b) => a - b)
    steps.push({ letter, own, prevOpen: open, fresh, closing, nextOpen })
    open = nextOpen
  })
  const all = distinctLabels(letters)
  return { steps, external: all.filter((x) => external.has(x) && !fixed.has(x)).sort((a, b) => a - b), maxLabel: Math.max(0, ...all) }
}

/** The cyclic rotation of a trace with the fewest open labels along the way (cost Σ 4^{open + fresh}). */
export function bestRotation(letters: readonly Letter[], external: ReadonlySet<number>, fixed: ReadonlySet<number> = new Set()): Letter[] {
  let best: Letter[] = [...letters]
  let bestCost = Infinity
  for (let r = 0; r < letters.length; r++) {
    const rot = [...letters.slice(r), ...letters.slice(0, r)]
    const cost = compileTrace(rot, external, fixed).steps.reduce((s, st) => s + 4 ** (st.prevOpen.length + st.fresh.length), 0)
    if (cost < bestCost) {
      bestCost = cost
      best = rot
    }
  }
  return best
}
