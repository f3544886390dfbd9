/**
 * Character tables of the finite flavour groups we ship: S3, A4, S4, Q8, T′ = SL(2,3) (the
 * binary tetrahedral group) and Δ(27) (the Heisenberg group of order 27). Each class lists its
 * size, its element order and its power map (powers[r mod order] = class of g^r), so Adams
 * operations ψ^r χ(g) = χ(g^r) are exact. Values are Eisenstein integers (eisenstein.ts).
 *
 * Irrep names (ours where the literature varies):
 * - S3: 1, 1' (sign), 2.   A4: 1, 1' (χ = ω on the class of (123)), 1'' = conj, 3.
 * - S4: 1, 1' (sign), 2, 3 (the permutation representation minus the trivial one, χ((12)) = +1), 3' = 3 ⊗ 1'.
 * - Q8: 1++, 1+-, 1-+, 1-- (signs of χ(i), χ(j)), 2.
 * - T′: 1, 1', 1'' (from A4 = T′/Z2), 2 (the SU(2) doublet), 2' = 2 ⊗ 1', 2'' = 2 ⊗ 1'', 3.
 * - Δ(27): 1_rs (r, s = 0, 1, 2; χ = ω^{ra+sb} on the class of image (a, b) in Z3 × Z3), 3 (χ(z) = 3ω on the
 *   central generator z), 3bar.
 * Reference: Ishimori, Kobayashi, Ohki, Shimizu, Okada, Tanimoto, Prog. Theor. Phys. Suppl. 183
 * (2010) 1 (sections on S3, A4, S4, T′, Q8 and Δ(27)); James & Liebeck, Representations and
 * Characters of Groups (CUP 2001), ch. 18–19. Checked in tests by the orthogonality relations.
 */
import { type Eis, OMEGA, OMEGA2, eConj, eMul, eScale } from './eisenstein'

export type FiniteKind = 'S3' | 'A4' | 'S4' | 'Q8' | 'Tprime' | 'Delta27'

export interface FiniteClass {
  size: number
  order: number
  /** Class of g^r for r = 0 .. order − 1. */
  powers: number[]
}

export interface FiniteGroupTable {
  kind: FiniteKind
  /** Readable name, e.g. "T′", "Δ(27)". */
  label: string
  order: number
  classes: FiniteClass[]
  irreps: { name: string; chi: Eis[] }[]
}

const n = (x: number): Eis => [x, 0]
const row = (...xs: (number | Eis)[]): Eis[] => xs.map((x) => (typeof x === 'number' ? n(x) : x))
const W = OMEGA
const W2 = OMEGA2

const S3: FiniteGroupTable = {
  kind: 'S3',
  label: 'S3',
  order: 6,
  // e, (12), (123)
  classes: [
    { size: 1, order: 1, powers: [0] },
    { size: 3, order: 2, powers: [0, 1] },
    { size: 2, order: 3, powers: [0, 2, 2] },
  ],
  irreps: [
    { name: '1', chi: row(1, 1, 1) },
    { name: "1'", chi: row(1, -1, 1) },
    { name: '2', chi: row(2, 0, -1) },
  ],
}

const A4: FiniteGroupTable = {
  kind: 'A4',
  label: 'A4',
  order: 12,
  // e, (12)(34), (123), (132)
  classes: [
    { size: 1, order: 1, powers: [0] },
    { size: 3, order: 2, powers: [0, 1] },
    { size: 4, order: 3, powers: [0, 2, 3] },
    { size: 4, order: 3, powers: [0, 3, 2] },
  ],
  irreps: [
    { name: '1', chi: row(1, 1, 1, 1) },
    { name: "1'", chi: row(1, 1, W, W2) },
    { name: "1''", chi: row(1, 1, W2, W) },
    { name: '3', chi: row(3, -1, 0, 0) },
  ],
}

const S4: FiniteGroupTable = {
  kind: 'S4',
  label: 'S4',
  order: 24,
  // e, (12), (12)(34), (123), (1234)
  classes: [
    { size: 1, order: 1, powers: [0] },
    { size: 6, order: 2, powers: [0, 1] },
    { size: 3, order: 2, powers: [0, 2] },
    { size: 8, order: 3, powers: [0, 3, 3] },
    { size: 6, order: 4, powers: [0, 4, 2, 4] },
  ],
  irreps: [
    { name: '1', chi: row(1, 1, 1, 1, 1) },
    { name: "1'", chi: row(1, -1, 1, 1, -1) },
    { name: '2', chi: row(2, 0, 2, -1, 0) },
    { name: '3', chi: row(3, 1, -1, 0, -1) },
    { name: "3'", chi: row(3, -1, -1, 0, 1) },
  ],
}

const Q8: FiniteGroupTable = {
  kind: 'Q8',
  label: 'Q8',
  order: 8,
  // 1, −1, ±i, ±j, ±k
  classes: [
    { size: 1, order: 1, powers: [0] },
    { size: 1, order: 2, powers: [0, 1] },
    { size: 2, order: 4, powers: [0, 2, 1, 2] },
    { size: 2, order: 4, powers: [0, 3, 1, 3] },
    { size: 2, order: 4, powers: [0, 4, 1, 4] },
  ],
  irreps: [
    { name: '1++', chi: row(1, 1, 1, 1, 1) },
    { name: '1+-', chi: row(1, 1, 1, -1, -1) },
    { name: '1-+', chi: row(1, 1, -1, 1, -1) },
    { name: '1--', chi: row(1, 1, -1, -1, 1) },
    { name: '2', chi: row(2, -2, 0, 0, 0) },
  ],
}

/** T′: 1, −1, order 4 (6), a and a^{−1} of order 3 (4 each), −a and −a^{−1} of order 6 (4 each). */
const tDoublet = row(2, -2, 0, -1, -1, 1, 1)
const tOneP = row(1, 1, 1, W, W2, W, W2)
const Tprime: FiniteGroupTable = {
  kind: 'Tprime',
  label: 'T′',
  order: 24,
  classes: [
    { size: 1, order: 1, powers: [0] },
    { size: 1, order: 2, powers: [0, 1] },
    { size: 6, order: 4, powers: [0, 2, 1, 2] },
    { size: 4, order: 3, powers: [0, 3, 4] },
    { size: 4, order: 3, powers: [0, 4, 3] },
    { size: 4, order: 6, powers: [0, 5, 4, 1, 3, 6] },
    { size: 4, order: 6, powers: [0, 6, 3, 1, 4, 5] },
  ],
  irreps: [
    { name: '1', chi: row(1, 1, 1, 1, 1, 1, 1) },
    { name: "1'", chi: tOneP },
    { name: "1''", chi: tOneP.map(eConj) },
    { name: '2', chi: tDoublet },
    { name: "2'", chi: tDoublet.map((x, i) => eMul(x, tOneP[i]!)) },
    { name: "2''", chi: tDoublet.map((x, i) => eMul(x, eConj(tOneP[i]!))) },
    { name: '3', chi: row(3, 3, -1, 0, 0, 0, 0) },
  ],
}

/** Δ(27): classes z^0, z^1, z^2 (central), then the 8 classes of image (a, b) ≠ (0, 0) in Z3 × Z3. */
function delta27(): FiniteGroupTable {
  const images: [number, number][] = []
  for (let a = 0; a < 3; a++) for (let b = 0; b < 3; b++) if (a || b) images.push([a, b])
  const imageClass = (a: number, b: number): number => 3 + images.findIndex(([x, y]) => x === a % 3 && y === b % 3)
  const classes: FiniteClass[] = [
    { size: 1, order: 1, powers: [0] },
    { size: 1, order: 3, powers: [0, 1, 2] },
    { size: 1, order: 3, powers: [0, 2, 1] },
    ...images.map(([a, b]) => ({ size: 3, order: 3, powers: [0, imageClass(a, b), imageClass(2 * a, 2 * b)] })),
  ]
  const wPow = (k: number): Eis => [n(1), W, W2][((k % 3) + 3) % 3]!
  const irreps: { name: string; chi: Eis[] }[] = []
  for (let r = 0; r < 3; r++) {
    for (let s = 0; s < 3; s++) irreps.push({ name: `1_${r}${s}`, chi: [n(1), n(1), n(1), ...images.map(([a, b]) => wPow(r * a + s * b))] })
  }
  const three = [n(3), eScale(3, W), eScale(3, W2), ...images.map(() => n(0))]
  irreps.push({ name: '3', chi: three }, { name: '3bar', chi: three.map(eConj) })
  return { kind: 'Delta27', label: 'Δ(27)', order: 27, classes, irreps }
}

export const FINITE_GROUPS: Record<FiniteKind, FiniteGroupTable> = { S3, A4, S4, Q8, Tprime, Delta27: delta27() }

export const FINITE_KINDS = Object.keys(FINITE_GROUPS) as FiniteKind[]
