/**
 * Particles (on-shell legs) of a theory, in the all-outgoing helicity convention:
 * - a left-handed Weyl field ψ (lorentz "left-weyl") gives the leg ψ of helicity −1/2 (one λ) and
 *   its conjugate ψ* of helicity +1/2 (one λ̃); "right-weyl" is the mirror image (χ: +1/2, χ*: −1/2);
 * - a field strength X (lorentz "field-strength") gives X_L = self-dual half, helicity −1 (λλ), and
 *   X_R, helicity +1 (λ̃λ̃); they are each other's conjugates;
 * - a scalar H gives H and, unless real, H*.
 * SU(N) representations: fundamental (one upper index), antifundamental (one lower index),
 * adjoint (a traceless matrix X^i_j) or singlet; other irreps throw EngineInputError.
 */
import { EngineInputError } from '../errors'
import { parseRational, neg as ratNeg, type Rational } from '../exact/rational'
import type { Theory, TheoryField } from '../../../shared/schemas/theory'
import type { LorentzKind } from '../../../shared/schemas/lorentzKind'

export type SuKind = 'fund' | 'anti' | 'adj' | 'singlet'

export interface Particle {
  /** Label used in class keys: "H", "H*", "Q", "Q*", "G_L", "G_R". */
  label: string
  field: string
  conj: boolean
  lorentz: LorentzKind
  /** Twice the helicity. */
  helicity2: number
  /** Spinors of the undifferentiated field: angle (λ) and square (λ̃) counts. */
  angles: number
  squares: number
  fermion: boolean
  /** Twice the canonical mass dimension (scalar 2, fermion 3, field strength 4). */
  dim2: number
  su: Record<string, SuKind>
  u1: Record<string, Rational>
  zn: Record<string, number>
  flavors: number
  /** True when the theory declares "flavors" for the field (an --nf override applies). */
  flavored: boolean
  /** Label of the conjugate particle (itself when self-conjugate). */
  conjugate: string
}

function suKind(fieldName: string, group: string, n: number, labels: readonly number[]): SuKind {
  const key = labels.join(',')
  const zero = labels.every((a) => a === 0)
  if (zero) return 'singlet'
  const fund = [1, ...new Array(n - 2).fill(0)].join(',')
  const anti = [...new Array(n - 2).fill(0), 1].join(',')
  const adj = n === 2 ? '2' : [1, ...new Array(n - 3).fill(0), 1].join(',')
  if (key === fund) return 'fund'
  if (key === anti) return 'anti'
  if (key === adj) return 'adj'
  throw new EngineInputError('theoryParticles', `Field ${fieldName} sits in the representation [${key}] of ${group} = SU(${n}); explicit bases support the fundamental, antifundamental, adjoint and singlet only (counts support any)`)
}

/** Angle spinors, square spinors and doubled mass dimension of the undifferentiated field. */
const SPIN: Record<LorentzKind, readonly [number, number, number]> = {
  'scalar': [0, 0, 2], 'left-weyl': [1, 0, 3], 'right-weyl': [0, 1, 3], 'field-strength': [2, 0, 4],
}

const conjKind: Record<SuKind, SuKind> = { fund: 'anti', anti: 'fund', adj: 'adj', singlet: 'singlet' }

function baseParticle(t: Theory, f: TheoryField): Particle {
  const su: Record<string, SuKind> = {}
  const u1: Record<string, Rational> = {}
  const zn: Record<string, number> = {}
  for (const g of t.groups) {
    if (g.type === 'SU') {
      const n = g.n ?? 0
      if (f.lorentz === 'field-strength') su[g.name] = f.gaugeOf === g.name ? 'adj' : 'singlet'
      else su[g.name] = suKind(f.name, g.name, n, f.reps?.[g.name] ?? new Array(n - 1).fill(0))
    } else if (g.type === 'U1') {
      u1[g.name] = parseRational(String(f.charges?.[g.name] ?? '0'))
    } else {
      const n = g.n ?? 1
      zn[g.name] = ((Number(f.charges?.[g.name] ?? 0) % n) + n) % n
    }
  }
  const spin = SPIN[f.lorentz]
  const strength = f.lorentz === 'field-strength'
  const label = strength ? `${f.name}_L` : f.name
  const selfConj = f.lorentz === 'scalar' && f.real === true
  return {
    label, field: f.name, conj: false, lorentz: f.lorentz, helicity2: spin[1] - spin[0],
    angles: spin[0], squares: spin[1], fermion: f.lorentz === 'left-weyl' || f.lorentz === 'right-weyl', dim2: spin[2],
    su, u1, zn, flavors: f.flavors ?? 1, flavored: f.flavors !== undefined,
    conjugate: strength ? `${f.name}_R` : selfConj ? f.name : `${f.name}*`,
  }
}

function conjugateOf(t: Theory, p: Particle): Particle {
  const su = Object.fromEntries(Object.entries(p.su).map(([g, k]) => [g, conjKind[k]]))
  const u1 = Object.fromEntries(Object.entries(p.u1).map(([g, q]) => [g, ratNeg(q)]))
  const zn: Record<string, number> = {}
  for (const g of t.groups) if (g.type === 'Z') zn[g.name] = (((g.n ?? 1) - p.zn[g.name]!) % (g.n ?? 1))
  return {
    ...p, label: p.conjugate, conjugate: p.label, conj: true, helicity2: -p.helicity2,
    angles: p.squares, squares: p.angles, su, u1, zn,
  }
}

/**
 * All particles of a theory, each field followed by its conjugate when that differs.
 * @example theoryParticles(realScalarTheory).map(p => p.label) // ["phi"]
 * Method: helicity and representation bookkeeping (conventions above).
 * Reference: Elvang & Huang, Scattering Amplitudes (CUP 2015), §2.
 */
export function theoryParticles(t: Theory): Particle[] {
  if (t.frame !== 'relativistic') throw new EngineInputError('theoryParticles', `Explicit bases from contact amplitudes need the relativistic frame, but this theory uses the ${t.frame} frame`)
  const out: Particle[] = []
  for (const f of t.fields) {
    const p = baseParticle(t, f)
    out.push(p)
    if (p.conjugate !== p.label) out.push(conjugateOf(t, p))
  }
  return out
}
