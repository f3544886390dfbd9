/**
 * Numerical evaluation of symmetrised contact amplitudes over F_p at random on-shell
 * kinematics and random gauge wave-functions: the matrix whose rank is the number of
 * independent operators (modulo EOM and IBP, which hold automatically on shell).
 */
import { EngineCancelledError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import { SeededRandom } from '../finite/rng'
import type { Theory } from '../../../shared/schemas/theory'
import type { OperatorClass } from './classKey'
import { randomKinematics, type KinematicPoint } from './kinematics'
import { evaluateSu, randomSuWave, type SuStructure, type SuWave } from './gaugeStructures'
import type { LorentzStructure } from './lorentzStructures'
import { speciesShape } from './species'
import type { LegPermutation } from './symmetry'
import { symmetrisationPlan, type Pair } from './pairOrbits'

export interface SamplePoint {
  kin: KinematicPoint
  /** waves[g][leg] for each SU group in theory order (only groups listed in `groups`). */
  waves: SuWave[][]
}

/**
 * Draw `count` random points (kinematics and wave-functions) for a class.
 * @example samplePoints(F, t, cls, 10, 1).length // 10
 */
export function samplePoints(F: PrimeField, t: Theory, c: OperatorClass, count: number, seed: number): SamplePoint[] {
  const rng = new SeededRandom(seed)
  const draw = (): number => rng.below(F.p)
  const groups = t.groups.filter((g) => g.type === 'SU' && c.legs.some((p) => (p.suKind[g.name] ?? 'singlet') !== 'singlet'))
  const out: SamplePoint[] = []
  for (let r = 0; r < count; r++) {
    const kin = randomKinematics(F, rng, c.legs.length, c.legs.length === 3 && r % 2 === 1 ? 'square' : 'angle')
    const waves = groups.map((g) => c.legs.map((p) => randomSuWave(F, g.n ?? 0, p.suKind[g.name] ?? 'singlet', draw, speciesShape(p, g.name, g.n ?? 0))))
    out.push({ kin, waves })
  }
  return out
}

/**
 * Value of a bracket monomial with legs relabelled by `map`.
 * @example lorentzValue(F, {angle:[[0,1]],square:[],derivs:[0,0]}, k, [1,0]) // ⟨21⟩ = −⟨12⟩
 */
export function lorentzValue(F: PrimeField, l: LorentzStructure, kin: KinematicPoint, map: number[]): number {
  let v = 1
  for (const [i, j] of l.angle) v = F.mul(v, kin.angle[map[i]!]![map[j]!]!)
  for (const [i, j] of l.square) v = F.mul(v, kin.square[map[i]!]![map[j]!]!)
  return v
}

/**
 * Value of a product of SU(N) contractions with wave-functions relabelled by `map`.
 * @example gaugeValue(F, [], waves, map) // 1 (no charged legs)
 */
export function gaugeValue(F: PrimeField, g: SuStructure[], waves: SuWave[][], map: number[]): number {
  let v = 1
  g.forEach((s, gi) => {
    const w = map.map((m) => waves[gi]![m]!)
    v = F.mul(v, evaluateSu(F, s, w))
  })
  return v
}

export interface EvalTerm {
  lorentz: LorentzStructure
  gauge: SuStructure[]
  coeff: number
}

/**
 * Symmetrised amplitude rows: rows[r][c] = Σ_σ sign(σ) L_c(σ·k_r) G_c(σ·w_r) for the
 * lorentz × gauge product candidates (column c = l·|gauge| + g).
 * Method: Bose/Fermi symmetrisation of contact amplitudes (Durieux, Kitahara, Shadmi,
 * Weiss, JHEP 10 (2020) 175, §2).
 * @example amplitudeRows(F, [φ^4 structure], [[]], points, perms)[0][0] // 24 (4! permutations of a constant)
 */
export function amplitudeRows(F: PrimeField, lorentz: LorentzStructure[], gauge: SuStructure[][], points: SamplePoint[], perms: LegPermutation[], signal?: { aborted: boolean }): number[][] {
  const nG = gauge.length
  return points.map((pt) => {
    if (signal?.aborted) throw new EngineCancelledError('basis evaluation')
    const row = new Array<number>(lorentz.length * nG).fill(0)
    for (const perm of perms) {
      const L = lorentz.map((l) => lorentzValue(F, l, pt.kin, perm.map))
      const G = gauge.map((g) => gaugeValue(F, g, pt.waves, perm.map))
      for (let l = 0; l < L.length; l++) {
        const lv = perm.sign === 1 ? L[l]! : F.mul(L[l]!, F.from(perm.sign))
        if (lv === 0) continue
        for (let g = 0; g < nG; g++) row[l * nG + g] = (row[l * nG + g]! + lv * G[g]!) % F.p
      }
    }
    return row
  })
}

/**
 * Symmetrised value at each point of a linear combination of (lorentz, gauge) terms.
 * @example combinationValues(F, [{…, coeff: 2}], points, perms) // twice the single-term values
 */
export function combinationValues(F: PrimeField, terms: EvalTerm[], points: SamplePoint[], perms: LegPermutation[]): number[] {
  return points.map((pt) => {
    let total = 0
    for (const perm of perms) {
      for (const t of terms) {
        const v = F.mul(t.coeff, F.mul(lorentzValue(F, t.lorentz, pt.kin, perm.map), gaugeValue(F, t.gauge, pt.waves, perm.map)))
        total = F.add(total, perm.sign === 1 ? v : F.mul(v, F.from(perm.sign)))
      }
    }
    return total
  })
}

/**
 * Symmetrised values of individual (lorentz, gauge) pairs: rows[r][k] for pair k, from the
 * class's symmetrisation plan (pairOrbits.ts: each relabelled structure evaluated once per
 * point), or by the direct sum over permutations when there is no plan.
 * @example pairRows(F, [{lorentz: φ^4, gauge: []}], points, perms)[0] // [24]
 */
export function pairRows(F: PrimeField, pairs: Pair[], points: SamplePoint[], perms: LegPermutation[], signal?: { aborted: boolean }): number[][] {
  const plan = symmetrisationPlan(pairs, perms)
  if (!plan) return directPairRows(F, pairs, points, perms, signal)
  const identity = pairs[0] ? pairs[0].lorentz.derivs.map((_, i) => i) : []
  return points.map((pt) => {
    if (signal?.aborted) throw new EngineCancelledError('basis evaluation')
    const L = plan.lorentz.map((l) => lorentzValue(F, l, pt.kin, identity))
    const G = plan.gauge.map((g) => gaugeValue(F, g, pt.waves, identity))
    const row = new Array<number>(pairs.length).fill(0)
    for (const [k, terms] of plan.terms) {
      let v = 0
      for (const { l, g, coeff } of terms) v = F.add(v, F.mul(F.from(coeff), F.mul(L[l]!, G[g]!)))
      row[k] = v
    }
    plan.links.forEach((link, k) => {
      if (link.rep !== k) row[k] = link.sign === 1 ? row[link.rep]! : F.neg(row[link.rep]!)
    })
    return row
  })
}

/** pairRows by the sum over permutations at every point (the reference for the plan). */
export function directPairRows(F: PrimeField, pairs: Pair[], points: SamplePoint[], perms: LegPermutation[], signal?: { aborted: boolean }): number[][] {
  const uniqL = [...new Set(pairs.map((p) => p.lorentz))]
  const uniqG = [...new Set(pairs.map((p) => p.gauge))]
  const posL = new Map(uniqL.map((l, i) => [l, i]))
  const posG = new Map(uniqG.map((g, i) => [g, i]))
  const idx = pairs.map((p) => [posL.get(p.lorentz)!, posG.get(p.gauge)!] as const)
  return points.map((pt) => {
    if (signal?.aborted) throw new EngineCancelledError('basis evaluation')
    const row = new Array<number>(pairs.length).fill(0)
    for (const perm of perms) {
      const L = uniqL.map((l) => lorentzValue(F, l, pt.kin, perm.map))
      const G = uniqG.map((g) => gaugeValue(F, g, pt.waves, perm.map))
      const w = F.from(perm.sign)
      idx.forEach(([l, g], k) => {
        const v = F.mul(L[l]!, G[g]!)
        if (v !== 0) row[k] = (row[k]! + v * w) % F.p
      })
    }
    return row
  })
}
