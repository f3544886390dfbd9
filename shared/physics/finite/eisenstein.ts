/**
 * Eisenstein integers a + bω (ω = e^{2πi/3}, ω² = −1 − ω): exact character values of the
 * finite flavour groups we ship (all lie in Z[ω]).
 * Reference: Ireland & Rosen, A Classical Introduction to Modern Number Theory, ch. 9.1.
 */

/** [a, b] stands for a + bω. */
export type Eis = readonly [number, number]

export const E0: Eis = [0, 0]
export const E1: Eis = [1, 0]
export const OMEGA: Eis = [0, 1]
export const OMEGA2: Eis = [-1, -1]

function safe(x: number): number {
  // Character values of the shipped tables are tiny: overflow would be a programming error.
  if (!Number.isSafeInteger(x)) throw new RangeError(`eisenstein: value ${x} beyond 2^53`)
  return x
}

export function eAdd(x: Eis, y: Eis): Eis {
  return [safe(x[0] + y[0]), safe(x[1] + y[1])]
}

/** (a + bω)(c + dω) = (ac − bd) + (ad + bc − bd)ω. @example eMul(OMEGA, OMEGA) // [-1, -1] */
export function eMul(x: Eis, y: Eis): Eis {
  const bd = x[1] * y[1]
  return [safe(x[0] * y[0] - bd), safe(x[0] * y[1] + x[1] * y[0] - bd)]
}

/** Complex conjugate: ω̄ = ω² = −1 − ω. @example eConj(OMEGA) // [-1, -1] */
export function eConj(x: Eis): Eis {
  return [x[0] - x[1], -x[1]]
}

export function eScale(k: number, x: Eis): Eis {
  return [safe(k * x[0]), safe(k * x[1])]
}

export function eEqual(x: Eis, y: Eis): boolean {
  return x[0] === y[0] && x[1] === y[1]
}

/** Readable text, e.g. "2-ω". */
export function eText(x: Eis): string {
  if (x[1] === 0) return String(x[0])
  const w = x[1] === 1 ? 'ω' : x[1] === -1 ? '-ω' : `${x[1]}ω`
  return x[0] === 0 ? w : `${x[0]}${x[1] > 0 ? '+' : ''}${w}`
}
